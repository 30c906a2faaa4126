import { Injectable } from '@nestjs/common';
import { compareDocuments, type CircuitDocument } from '@linesmith/routing';
import { CircuitDraftsService } from '../circuits/circuit-drafts.service.js';
import { CircuitRevisionsService } from '../circuits/circuit-revisions.service.js';
import { RulesService } from '../rules/rules.service.js';
import type { DocumentRef } from './dto/review-input.schemas.js';
import type { CircuitComparisonDto, ComparisonSideDto } from './dto/review.dto.js';

/** "What changed since the last sign-off": two revisions (or a revision and the draft) side by side. */
@Injectable()
export class CircuitCompareService {
  constructor(
    private readonly drafts: CircuitDraftsService,
    private readonly revisions: CircuitRevisionsService,
    private readonly rules: RulesService,
  ) {}

  async compare(shopId: string, circuitId: string, from: DocumentRef, to: DocumentRef): Promise<CircuitComparisonDto> {
    const [before, after] = await Promise.all([this.side(shopId, circuitId, from), this.side(shopId, circuitId, to)]);
    return {
      comparison: compareDocuments(before.document, after.document, before.evaluation, after.evaluation),
      before,
      after,
    };
  }

  private async side(shopId: string, circuitId: string, ref: DocumentRef): Promise<ComparisonSideDto> {
    const document: CircuitDocument =
      ref === 'draft'
        ? (await this.drafts.get(shopId, circuitId)).document
        : (await this.revisions.get(shopId, circuitId, ref)).document;
    return { ref, document, evaluation: await this.rules.evaluate(shopId, document) };
  }
}
