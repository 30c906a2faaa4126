import type { Part, PartKind, SealNeed } from '@linesmith/catalog';
import type { LineAnalysis } from '../lines/analyse-line.js';
import type { PortEntry } from '../lines/port-entry.js';
import type { ShopRules } from '../rules/shop-rules.js';
import type { BillOfMaterials, BomRow } from './bom-row.js';
import { taxOf } from './order-sheet.js';
import { priceOf } from './price.js';
import { plugSealNeeds, sealDescription, sealKey, stackSealNeeds } from './seal-needs.js';

const KIND_ORDER: readonly PartKind[] = ['hose', 'hose-end', 'adapter', 'bulkhead', 'plug', 'seal', 'clamp', 'sleeve'];

interface Tally {
  part: Part | undefined;
  kind: PartKind;
  description: string;
  unit: 'in' | 'each';
  quantity: number;
  cuts: number;
  lineIds: Set<string>;
}

export interface BomInput {
  lines: readonly LineAnalysis[];
  ports: Iterable<PortEntry>;
  connectedPorts: ReadonlySet<string>;
  parts: ReadonlyMap<string, Part>;
  rules: ShopRules;
  /** The shop's sales tax rate in percent (from the shop profile, not the shop rules). */
  taxRatePercent: number;
}

/**
 * A circuit's bill of materials (DOMAIN §6): hose per part (cut lengths + trim per cut), hose
 * ends, adapters, bulkheads, plugs, the seals the ports and adapters need, one clamp per
 * support, sleeve per part. Unknown part ids are left out (the missing-part flag names them).
 */
export function billOfMaterials(input: BomInput): BillOfMaterials {
  const { parts, rules } = input;
  // Catalogue parts are keyed by the part object itself (all come from `parts`, one per id): no key
  // string to build and hash for every hose end and adapter of a large circuit.
  const tallies = new Map<Part | string, Tally>();
  const add = (key: Part | string, part: Part | undefined, kind: PartKind, description: string, unit: 'in' | 'each', quantity: number, lineId?: string) => {
    let tally = tallies.get(key);
    if (!tally) {
      tally = { part, kind, description, unit, quantity: 0, cuts: 0, lineIds: new Set() };
      tallies.set(key, tally);
    }
    tally.quantity += quantity;
    if (lineId) tally.lineIds.add(lineId);
    return tally;
  };
  const addPart = (part: Part, unit: 'in' | 'each', quantity: number, lineId?: string) =>
    add(part, part, part.kind, part.description, unit, quantity, lineId);
  const sealCatalogue = new Map<string, Part>();
  for (const part of parts.values()) {
    if (part.kind === 'seal' && !part.retired && !sealCatalogue.has(sealKey(part.attributes.seal))) {
      sealCatalogue.set(sealKey(part.attributes.seal), part);
    }
  }
  const addSeal = (need: SealNeed, lineId?: string) => {
    const part = sealCatalogue.get(sealKey(need));
    if (part) addPart(part, 'each', 1, lineId);
    else add(`seal:${sealKey(need)}`, undefined, 'seal', `${sealDescription(need)} (not in the catalogue)`, 'each', 1, lineId);
  };

  for (const line of input.lines) {
    const lineId = line.line.id;
    const cut = line.report.cutLengthIn;
    if (line.hose && cut !== null) addPart(line.hose, 'in', cut + rules.trimAllowanceIn, lineId).cuts += 1;
    for (const end of ['from', 'to'] as const) {
      const stack = line.stacks[end];
      for (const item of stack.items) if (item.part) addPart(item.part, 'each', 1, lineId);
      for (const need of stackSealNeeds(line[end], stack)) addSeal(need, lineId);
    }
    const supports = line.line.supports.length;
    if (supports > 0) {
      const clamp = line.report.clampPartId ? parts.get(line.report.clampPartId) : undefined;
      if (clamp) addPart(clamp, 'each', supports, lineId);
      else if (line.hose) {
        const od = line.hose.attributes.odIn;
        add(`clamp:${od}`, undefined, 'clamp', `Cushion clamp for ${od} in hose OD (not in the catalogue)`, 'each', supports, lineId);
      }
    }
    for (const sleeve of line.line.sleeves) {
      const part = sleeve.partId ? parts.get(sleeve.partId) : undefined;
      const length = sleeve.endIn - sleeve.startIn;
      if (part) addPart(part, 'in', length, lineId);
      else if (sleeve.partId === null) add('sleeve:unpicked', undefined, 'sleeve', 'Fire sleeve (no part picked)', 'in', length, lineId);
    }
  }
  for (const port of input.ports) {
    if (input.connectedPorts.has(port.key) || !port.port.plugPartId) continue;
    const plug = parts.get(port.port.plugPartId);
    if (plug) addPart(plug, 'each', 1);
    for (const need of plugSealNeeds(port, plug)) addSeal(need);
  }

  const rows: BomRow[] = [...tallies.values()].map((t) => {
    const row: BomRow = {
      partId: t.part?.id ?? null,
      kind: t.kind,
      description: t.description,
      quantity: t.quantity,
      unit: t.unit,
      priceCents: t.part ? priceOf(t.part.priceCents, t.part.saleUnit, t.quantity, t.unit) : null,
      supplierId: t.part?.supplierId ?? null,
      supplierPartNumber: t.part?.supplierPartNumber ?? '',
      lineIds: [...t.lineIds].sort(),
    };
    if (t.kind === 'hose' && t.part) row.cuts = t.cuts;
    return row;
  });
  const sortKey = (r: BomRow) => r.partId ?? `\uffff${r.description}`; // catalogue parts first, then the unlisted
  rows.sort((a, b) => KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) || (sortKey(a) < sortKey(b) ? -1 : sortKey(a) > sortKey(b) ? 1 : 0));
  const subtotalCents = rows.reduce((sum, r) => sum + (r.priceCents ?? 0), 0);
  const taxCents = taxOf(subtotalCents, input.taxRatePercent);
  return {
    rows,
    subtotalCents,
    taxCents,
    totalCents: subtotalCents + taxCents,
    unpricedRows: rows.filter((r) => r.priceCents === null).length,
  };
}
