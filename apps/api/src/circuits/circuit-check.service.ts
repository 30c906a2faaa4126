import { Injectable } from '@nestjs/common';
import type { CircuitEvaluation } from '@linesmith/routing';
import { RulesService } from '../rules/rules.service.js';
import { CircuitDraftsService } from './circuit-drafts.service.js';

/** Runs the shop's rules over a circuit's saved draft. */
@Injectable()
export class CircuitCheckService {
  constructor(
    private readonly drafts: CircuitDraftsService,
    private readonly rules: RulesService,
  ) {}

  async checkDraft(shopId: string, circuitId: string): Promise<CircuitEvaluation> {
    const { document } = await this.drafts.get(shopId, circuitId);
    return this.rules.evaluate(shopId, document);
  }
}
