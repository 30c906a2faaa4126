import type { Part, PartKind, SealNeed } from '@linesmith/catalog';
import type { LineAnalysis } from '../lines/analyse-line.js';
import type { PortEntry } from '../lines/port-entry.js';
import type { ShopRules } from '../rules/shop-rules.js';
import type { BillOfMaterials, BomRow } from './bom-row.js';
import { taxOf } from './order-sheet.js';
import { priceOf } from './price.js';
import { plugSealNeeds, SealCatalogue, sealDescription, sealKey, sealPartDescription, stackSealNeeds, suitedSealCatalogue, type SealService } from './seal-needs.js';

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
  /** The circuit's fluid and temperature, which pick each seal's compound. */
  seals?: SealService;
}

/** One addition to a bill of materials: what one line (or one plugged port) takes of one row. */
export interface BomEntry {
  /** The catalogue part itself, or a text key for a row without a part. */
  key: Part | string;
  part: Part | undefined;
  kind: PartKind;
  description: string;
  unit: 'in' | 'each';
  quantity: number;
  lineId?: string;
  /** A hose cut: counts towards the row's `cuts`. */
  cut?: true;
}

/**
 * The shop's seal parts by seal, for the seals the ports and adapters need: of several parts of
 * one size, the first whose compound suits the circuit's fluid and temperature (see seal-needs).
 */
export function sealCatalogueOf(parts: ReadonlyMap<string, Part>, service?: SealService): ReadonlyMap<string, Part> {
  return suitedSealCatalogue(parts, service);
}

const partEntry = (part: Part, unit: 'in' | 'each', quantity: number, lineId?: string): BomEntry => ({
  key: part,
  part,
  kind: part.kind,
  description: part.description,
  unit,
  quantity,
  lineId,
});

function sealEntry(need: SealNeed, sealCatalogue: ReadonlyMap<string, Part>, lineId?: string): BomEntry {
  const part = sealCatalogue.get(sealKey(need));
  if (part?.kind === 'seal') return { ...partEntry(part, 'each', 1, lineId), description: sealPartDescription(part) };
  if (part) return partEntry(part, 'each', 1, lineId);
  // Not in the catalogue: the row names the compound to buy for the circuit's fluid.
  const buy = sealCatalogue instanceof SealCatalogue ? sealCatalogue.compoundToBuy : undefined;
  return { key: `seal:${sealKey(need)}`, part: undefined, kind: 'seal', description: `${sealDescription(need, buy)} (not in the catalogue)`, unit: 'each', quantity: 1, lineId };
}

/** What one line adds to the bill: its hose cut, end stacks and their seals, clamps and sleeves. */
export function lineBomEntries(line: LineAnalysis, parts: ReadonlyMap<string, Part>, rules: ShopRules, sealCatalogue: ReadonlyMap<string, Part>): BomEntry[] {
  const entries: BomEntry[] = [];
  const lineId = line.line.id;
  const cut = line.report.cutLengthIn;
  if (line.hose && cut !== null) entries.push({ ...partEntry(line.hose, 'in', cut + rules.trimAllowanceIn, lineId), cut: true });
  for (const end of ['from', 'to'] as const) {
    const stack = line.stacks[end];
    for (const item of stack.items) if (item.part) entries.push(partEntry(item.part, 'each', 1, lineId));
    for (const need of stackSealNeeds(line[end], stack)) entries.push(sealEntry(need, sealCatalogue, lineId));
  }
  const supports = line.line.supports.length;
  if (supports > 0) {
    const clamp = line.report.clampPartId ? parts.get(line.report.clampPartId) : undefined;
    if (clamp) entries.push(partEntry(clamp, 'each', supports, lineId));
    else if (line.hose) {
      const od = line.hose.attributes.odIn;
      entries.push({ key: `clamp:${od}`, part: undefined, kind: 'clamp', description: `Cushion clamp for ${od} in hose OD (not in the catalogue)`, unit: 'each', quantity: supports, lineId });
    }
  }
  for (const sleeve of line.line.sleeves) {
    const part = sleeve.partId ? parts.get(sleeve.partId) : undefined;
    const length = sleeve.endIn - sleeve.startIn;
    if (part) entries.push(partEntry(part, 'in', length, lineId));
    else if (sleeve.partId === null) entries.push({ key: 'sleeve:unpicked', part: undefined, kind: 'sleeve', description: 'Fire sleeve (no part picked)', unit: 'in', quantity: length, lineId });
  }
  return entries;
}

/** What a port without a line adds: its plug and the plug's seals (nothing for an open port). */
export function portBomEntries(port: PortEntry, connected: boolean, parts: ReadonlyMap<string, Part>, sealCatalogue: ReadonlyMap<string, Part>): BomEntry[] {
  if (connected || !port.port.plugPartId) return [];
  const entries: BomEntry[] = [];
  const plug = parts.get(port.port.plugPartId);
  if (plug) entries.push(partEntry(plug, 'each', 1));
  for (const need of plugSealNeeds(port, plug)) entries.push(sealEntry(need, sealCatalogue));
  return entries;
}

/**
 * Sums entries, in the order given, into rows: priced, sorted by kind then part, taxed. The order
 * matters only to floating-point sums, so callers pass lines in document order, then the ports.
 */
export function foldBom(entryLists: Iterable<readonly BomEntry[]>, taxRatePercent: number): BillOfMaterials {
  return finishBom(tallyBomRows(entryLists), taxRatePercent);
}

/** One priced row per key, in the order the keys first appear (each row depends on its own entries only). */
export function tallyBomRows(entryLists: Iterable<readonly BomEntry[]>): BomRow[] {
  // Catalogue parts are keyed by the part object itself (all come from `parts`, one per id): no key
  // string to build and hash for every hose end and adapter of a large circuit.
  const tallies = new Map<Part | string, Tally>();
  for (const entries of entryLists) {
    for (const entry of entries) {
      let tally = tallies.get(entry.key);
      if (!tally) {
        tally = { part: entry.part, kind: entry.kind, description: entry.description, unit: entry.unit, quantity: 0, cuts: 0, lineIds: new Set() };
        tallies.set(entry.key, tally);
      }
      tally.quantity += entry.quantity;
      if (entry.lineId) tally.lineIds.add(entry.lineId);
      if (entry.cut) tally.cuts += 1;
    }
  }

  return [...tallies.values()].map((t) => bomRow(t, t.quantity, t.cuts, [...t.lineIds].sort()));
}

/** The row of one key: `first` is its first entry (part, kind, description, unit), with the sums over all its entries. */
export function bomRow(first: Pick<BomEntry, 'part' | 'kind' | 'description' | 'unit'>, quantity: number, cuts: number, lineIds: string[]): BomRow {
  const part = first.part;
  const row: BomRow = {
    partId: part?.id ?? null,
    kind: first.kind,
    description: first.description,
    quantity,
    unit: first.unit,
    priceCents: part ? priceOf(part.priceCents, part.saleUnit, quantity, first.unit) : null,
    supplierId: part?.supplierId ?? null,
    supplierPartNumber: part?.supplierPartNumber ?? '',
    lineIds,
  };
  if (first.kind === 'hose' && part) row.cuts = cuts;
  return row;
}

/** Rows in bill order (kind, then part), with the subtotal, tax and total. */
export function finishBom(unsorted: readonly BomRow[], taxRatePercent: number): BillOfMaterials {
  const rows = [...unsorted];
  const sortKey = (r: BomRow) => r.partId ?? `\uffff${r.description}`; // catalogue parts first, then the unlisted
  rows.sort((a, b) => KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) || (sortKey(a) < sortKey(b) ? -1 : sortKey(a) > sortKey(b) ? 1 : 0));
  const subtotalCents = rows.reduce((sum, r) => sum + (r.priceCents ?? 0), 0);
  const taxCents = taxOf(subtotalCents, taxRatePercent);
  return {
    rows,
    subtotalCents,
    taxCents,
    totalCents: subtotalCents + taxCents,
    unpricedRows: rows.filter((r) => r.priceCents === null).length,
  };
}

/**
 * A circuit's bill of materials (DOMAIN §6): hose per part (cut lengths + trim per cut), hose
 * ends, adapters, bulkheads, plugs, the seals the ports and adapters need, one clamp per
 * support, sleeve per part. Unknown part ids are left out (the missing-part flag names them).
 */
export function billOfMaterials(input: BomInput): BillOfMaterials {
  const { parts, rules } = input;
  const sealCatalogue = sealCatalogueOf(parts, input.seals);
  const lists: BomEntry[][] = [];
  for (const line of input.lines) lists.push(lineBomEntries(line, parts, rules, sealCatalogue));
  for (const port of input.ports) lists.push(portBomEntries(port, input.connectedPorts.has(port.key), parts, sealCatalogue));
  return foldBom(lists, input.taxRatePercent);
}
