import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { CircuitDocument, CircuitEvaluation } from '@linesmith/routing';
import type { DataSource } from 'typeorm';
import { NotFoundError } from '../common/errors/app-error.js';
import { RulesService, SHOP_INPUTS_SQL, type ShopInputsRow } from '../rules/rules.service.js';
import { readStoredDocument } from './circuit-document.js';

/** The draft as text next to the shop's inputs: one round trip per check, scoped to the caller's shop. */
const CHECK_INPUTS_SQL = `
  SELECT c."draft"::text AS "draftJson", inputs.*
  FROM "circuits" c CROSS JOIN LATERAL (${SHOP_INPUTS_SQL}) inputs
  WHERE c."id" = $2 AND c."shop_id" = $1`;

/** Parsed drafts kept: enough for the circuits being worked on; the oldest entry goes first. */
const PARSED_DRAFTS_KEPT = 200;

/** Freezes a parsed document all the way down: a cached draft is shared by concurrent checks. */
function frozen<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    for (const child of Object.values(value)) frozen(child);
    Object.freeze(value);
  }
  return value;
}

/** Runs the shop's rules over a circuit's saved draft. */
@Injectable()
export class CircuitCheckService {
  /**
   * The last parsed draft of each recently checked circuit with the stored text it came from, so an
   * unchanged draft is not parsed and migrated again; any write, by any path, changes the text.
   */
  private readonly parsedDrafts = new Map<string, { json: string; document: CircuitDocument }>();

  constructor(
    private readonly rules: RulesService,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  async checkDraft(shopId: string, circuitId: string): Promise<CircuitEvaluation> {
    const [row] = (await this.dataSource.query(CHECK_INPUTS_SQL, [shopId, circuitId])) as Array<ShopInputsRow & { draftJson: string }>;
    if (!row) throw new NotFoundError('The circuit');
    return this.rules.evaluateWith(shopId, this.documentOf(shopId, circuitId, row.draftJson), row);
  }

  private documentOf(shopId: string, circuitId: string, json: string): CircuitDocument {
    const key = `${shopId}/${circuitId}`;
    const hit = this.parsedDrafts.get(key);
    if (hit?.json === json) return hit.document;
    const document = frozen(readStoredDocument(JSON.parse(json)));
    this.parsedDrafts.delete(key);
    this.parsedDrafts.set(key, { json, document });
    if (this.parsedDrafts.size > PARSED_DRAFTS_KEPT) this.parsedDrafts.delete(this.parsedDrafts.keys().next().value as string);
    return document;
  }
}
