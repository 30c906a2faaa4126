import { circuitDocumentSchema } from '@linesmith/routing';
import { zodDto } from '../../common/validation/zod-dto.js';

/** A circuit document at the current schema version; failures answer 400 with the path of each issue. */
export class CircuitDocumentDto extends zodDto(circuitDocumentSchema) {}
