import { Injectable } from '@nestjs/common';
import type { CircuitDocument } from '@linesmith/routing';
import { ConflictError } from '../common/errors/app-error.js';
import { CircuitDraftsService } from '../circuits/circuit-drafts.service.js';
import { CircuitRevisionsService } from '../circuits/circuit-revisions.service.js';
import { CircuitsService } from '../circuits/circuits.service.js';
import { ShopCatalogueService } from '../parts/shop-catalogue.service.js';
import { RulesService } from '../rules/rules.service.js';
import { approvedRevisionNumber } from './approved-revision.js';
import { cutListWorkbook } from './cut-list.workbook.js';
import { safeFileName, workbookBuffer } from './spreadsheet.js';

export interface CutListChoice {
  revision?: number;
  draft: boolean;
}

export interface CutListFile {
  fileName: string;
  body: Buffer;
}

/** The cut list and parts of a circuit as a spreadsheet. */
@Injectable()
export class CutListService {
  constructor(
    private readonly circuits: CircuitsService,
    private readonly drafts: CircuitDraftsService,
    private readonly revisions: CircuitRevisionsService,
    private readonly rules: RulesService,
    private readonly catalogue: ShopCatalogueService,
  ) {}

  /**
   * Of the revision asked for, the draft when `draft` is set, or else the latest signed-off revision.
   */
  async export(shopId: string, circuitId: string, choice: CutListChoice): Promise<CutListFile> {
    const circuit = await this.circuits.getOwn(shopId, circuitId);
    const { document, basis, suffix, revisionNumber } = await this.documentOf(shopId, circuitId, choice);
    // A signed-off revision keeps the numbers its reviewer approved; drafts and open revisions are checked now.
    const stored = revisionNumber === undefined ? null : await this.revisions.signedOffEvaluation(shopId, circuitId, revisionNumber);
    const [evaluation, catalogue] = await Promise.all([stored ?? this.rules.evaluate(shopId, document), this.catalogue.partsOf(shopId)]);
    const workbook = cutListWorkbook({
      title: `${circuit.name}: cut list and parts`,
      basis,
      document,
      evaluation,
      parts: new Map(catalogue.map((part) => [part.id, part])),
    });
    return { fileName: safeFileName(`${circuit.name}-${suffix}-cut-list.xlsx`), body: await workbookBuffer(workbook) };
  }

  private async documentOf(
    shopId: string,
    circuitId: string,
    choice: CutListChoice,
  ): Promise<{ document: CircuitDocument; basis: string; suffix: string; revisionNumber?: number }> {
    if (choice.revision !== undefined) {
      const revision = await this.revisions.get(shopId, circuitId, choice.revision);
      return { document: revision.document, basis: `Revision ${revision.number}`, suffix: `rev${revision.number}`, revisionNumber: revision.number };
    }
    if (choice.draft) {
      const draft = await this.drafts.get(shopId, circuitId);
      return { document: draft.document, basis: 'Draft: not reviewed, do not build from it', suffix: 'draft' };
    }
    const approved = approvedRevisionNumber(await this.revisions.list(shopId, circuitId));
    if (approved === undefined) {
      throw new ConflictError('This circuit has no approved revision yet. Export the draft instead, or a numbered revision.');
    }
    const revision = await this.revisions.get(shopId, circuitId, approved);
    return {
      document: revision.document,
      basis: `Approved revision ${revision.number}`,
      suffix: `rev${revision.number}`,
      revisionNumber: revision.number,
    };
  }
}
