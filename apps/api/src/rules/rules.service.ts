import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Part } from '@linesmith/catalog';
import type { CircuitDocument, CircuitEvaluation } from '@linesmith/routing';
import type { DataSource } from 'typeorm';
import { NotFoundError } from '../common/errors/app-error.js';
import { catalogueFingerprintSql, ShopCatalogueService } from '../parts/shop-catalogue.service.js';
import { ShopRulesService } from '../shop-rules/shop-rules.service.js';
import { Engine } from './engine/engine-pool.service.js';

/** Kinds the engine picks from the whole catalogue by itself: clamps by hose OD, sleeves and seals for the bill of materials. */
const PICKED_BY_THE_ENGINE = new Set<Part['kind']>(['clamp', 'sleeve', 'seal']);

/**
 * Everything of the shop (id in `$1`) a check depends on, fresh, in one round trip: the profile's
 * tax rate, the saved rules as text and the catalogue fingerprint. The parsed rules and the parts
 * come from per-shop caches keyed by those values, so nothing is stale and nothing is re-read
 * unchanged. The check of a stored draft embeds it next to the draft read.
 */
export const SHOP_INPUTS_SQL = `
  SELECT s."tax_rate_percent" AS "taxRatePercent",
         r."rules"::text AS "rulesJson",
         ${catalogueFingerprintSql(1)} AS "catalogueFingerprint"
  FROM "shops" s LEFT JOIN "shop_rules" r ON r."shop_id" = s."id"
  WHERE s."id" = $1`;

export interface ShopInputsRow {
  /** numeric arrives as a string. */
  taxRatePercent: string;
  rulesJson: string | null;
  catalogueFingerprint: string;
}

/** Every part id a circuit document names: hoses, end stacks, plugs and placed sleeves. */
export function partIdsOf(doc: CircuitDocument): Set<string> {
  const ids = new Set<string>();
  for (const unit of doc.units) for (const port of unit.ports) if (port.plugPartId) ids.add(port.plugPartId);
  for (const line of doc.lines) {
    if (line.hosePartId) ids.add(line.hosePartId);
    for (const id of [...line.endStacks.from, ...line.endStacks.to]) ids.add(id);
    for (const sleeve of line.sleeves) if (sleeve.partId) ids.add(sleeve.partId);
  }
  return ids;
}

/** The authoritative check of a circuit against the caller's own catalogue and shop rules. */
@Injectable()
export class RulesService {
  constructor(
    private readonly catalogue: ShopCatalogueService,
    private readonly shopRules: ShopRulesService,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly engine: Engine,
  ) {}

  /**
   * Lines (cut-length terms), flags and bill of materials (taxed at the shop profile's rate) of a validated document. Part ids the
   * shop does not own are simply unknown to the engine, which flags them.
   */
  async evaluate(shopId: string, doc: CircuitDocument): Promise<CircuitEvaluation> {
    const [inputs] = (await this.dataSource.query(SHOP_INPUTS_SQL, [shopId])) as ShopInputsRow[];
    if (!inputs) throw new NotFoundError('The shop');
    return this.evaluateWith(shopId, doc, inputs);
  }

  /** As `evaluate`, with the shop's inputs already read by `SHOP_INPUTS_SQL` in the caller's query. */
  async evaluateWith(shopId: string, doc: CircuitDocument, inputs: ShopInputsRow): Promise<CircuitEvaluation> {
    const catalogue = await this.catalogue.partsAt(shopId, inputs.catalogueFingerprint);
    const rules = this.shopRules.rulesFromStored(shopId, inputs.rulesJson);
    const named = partIdsOf(doc);
    const parts = catalogue.filter((part) => named.has(part.id) || PICKED_BY_THE_ENGINE.has(part.kind));
    // Checked in the engine's worker pool, within its work budget (400 circuit_too_complex above it).
    // Each worker keeps an incremental evaluator per shop, catalogue, rules and set of parts named.
    const evaluatorKey = [shopId, inputs.catalogueFingerprint, inputs.taxRatePercent, inputs.rulesJson ?? '', [...named].sort().join(',')].join('\u0000');
    return this.engine.evaluate({ evaluatorKey, doc, parts, rules, taxRatePercent: Number(inputs.taxRatePercent) });
  }
}
