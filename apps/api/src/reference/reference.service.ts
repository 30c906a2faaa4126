import { Injectable } from '@nestjs/common';
import {
  families,
  familyLabel,
  identifyThread,
  listSizes,
  mate,
  solveAdapters,
  threadTable,
  type ConnectionSpec,
  type Family,
  type ThreadReading,
} from '@linesmith/catalog';
import { ruleRegistry } from '@linesmith/routing';
import type { PartDto } from '../parts/dto/part.dto.js';
import { ShopCatalogueService } from '../parts/shop-catalogue.service.js';
import type {
  AdaptersBody,
  AdaptersResultDto,
  FamilyDto,
  IdentifyResultDto,
  MateResultDto,
  RuleInfoDto,
  ThreadTableDto,
} from './dto/reference.schemas.js';

/** Thin answers over the catalogue and routing libraries for the Reference page and the editor. */
@Injectable()
export class ReferenceService {
  constructor(private readonly catalogue: ShopCatalogueService) {}

  families(): FamilyDto[] {
    return families.map((family) => ({ family, label: familyLabel(family), sizes: listSizes(family) }));
  }

  threads(family?: Family): ThreadTableDto[] {
    return (family ? [family] : families).map((f) => ({ family: f, label: familyLabel(f), rows: threadTable(f) }));
  }

  identify(reading: ThreadReading): IdentifyResultDto {
    return { candidates: identifyThread(reading) };
  }

  mate(a: ConnectionSpec, b: ConnectionSpec): MateResultDto {
    return mate(a, b);
  }

  /** Chains of the caller's own catalogue parts joining a port to a hose end's port side. */
  async adapters(shopId: string, body: AdaptersBody): Promise<AdaptersResultDto> {
    const parts = await this.catalogue.partsOf(shopId);
    const { port, hoseEndSide, ...options } = body;
    const chains = solveAdapters(port, hoseEndSide, parts, options);
    // The solver hands back the very catalogue objects it was given: PartDto, version included.
    return { chains: chains.map((chain) => ({ ...chain, parts: chain.parts as PartDto[] })) };
  }

  rules(): RuleInfoDto[] {
    return ruleRegistry.map(({ code, severity, title, description }) => ({ code, severity, title, description }));
  }
}
