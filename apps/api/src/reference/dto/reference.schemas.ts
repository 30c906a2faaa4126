import {
  connectionSpecSchema,
  familySchema,
  portRequirementSchema,
  solveOptionsSchema,
  threadReadingSchema,
  type AdapterChain,
  type Family,
  type MateResult,
  type ReferenceRow,
  type ThreadCandidate,
} from '@linesmith/catalog';
import type { Severity } from '@linesmith/routing';
import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import type { PartDto } from '../../parts/dto/part.dto.js';

export const threadsQuerySchema = z.object({ family: familySchema.optional() });
export class ThreadsQueryDto extends zodDto(threadsQuerySchema) {}

/** The library's bench reading: a positive diameter (in or mm) and/or TPI or pitch, and taper. */
export class ThreadReadingDto extends zodDto(threadReadingSchema) {}

export const mateBodySchema = z.object({ a: connectionSpecSchema, b: connectionSpecSchema });
export class MateBodyDto extends zodDto(mateBodySchema) {}

const solveOptions = solveOptionsSchema.shape;
export const adaptersBodySchema = z.object({
  port: connectionSpecSchema,
  hoseEndSide: connectionSpecSchema,
  requirement: portRequirementSchema.optional(),
  maxParts: solveOptions.maxParts,
  limit: solveOptions.limit,
});
export class AdaptersBodyDto extends zodDto(adaptersBodySchema) {}
export type AdaptersBody = z.output<typeof adaptersBodySchema>;

export interface FamilyDto {
  family: Family;
  label: string;
  sizes: string[];
}

export interface ThreadTableDto {
  family: Family;
  label: string;
  rows: ReferenceRow[];
}

export interface IdentifyResultDto {
  candidates: ThreadCandidate[];
}

export type MateResultDto = MateResult;

/** A solver chain whose parts are the caller's catalogue parts in their API shape. */
export type AdapterChainDto = Omit<AdapterChain, 'parts'> & { parts: PartDto[] };

export interface AdaptersResultDto {
  chains: AdapterChainDto[];
}

export interface RuleInfoDto {
  code: string;
  severity: Severity;
  title: string;
  description: string;
}
