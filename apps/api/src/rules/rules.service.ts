import { Injectable } from '@nestjs/common';
import type { Part } from '@linesmith/catalog';
import { evaluateCircuit, type CircuitDocument, type CircuitEvaluation } from '@linesmith/routing';
import { ShopCatalogueService } from '../parts/shop-catalogue.service.js';
import { ShopRulesService } from '../shop-rules/shop-rules.service.js';
import { ShopsService } from '../shops/shops.service.js';

/** Kinds the engine picks from the whole catalogue by itself: clamps by hose OD, sleeves and seals for the bill of materials. */
const PICKED_BY_THE_ENGINE = new Set<Part['kind']>(['clamp', 'sleeve', 'seal']);

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
    private readonly shops: ShopsService,
  ) {}

  /**
   * Lines (cut-length terms), flags and bill of materials (taxed at the shop profile's rate) of a validated document. Part ids the
   * shop does not own are simply unknown to the engine, which flags them.
   */
  async evaluate(shopId: string, doc: CircuitDocument): Promise<CircuitEvaluation> {
    const [catalogue, rules, shop] = await Promise.all([
      this.catalogue.partsOf(shopId),
      this.shopRules.rulesOf(shopId),
      this.shops.getOwnShop(shopId),
    ]);
    const named = partIdsOf(doc);
    const parts = catalogue.filter((part) => named.has(part.id) || PICKED_BY_THE_ENGINE.has(part.kind));
    return evaluateCircuit(doc, parts, rules, { taxRatePercent: shop.taxRatePercent });
  }
}
