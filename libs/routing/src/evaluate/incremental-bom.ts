import type { Part } from '@linesmith/catalog';
import { bomRow, finishBom, tallyBomRows, type BomEntry } from '../bom/bill-of-materials.js';
import type { BillOfMaterials, BomRow } from '../bom/bom-row.js';

/**
 * The bill of materials of the incremental evaluator: `foldBom` over the same lists in the same
 * order, but only the rows that a changed list touches are tallied again, from all their entries
 * in list order (so the floating-point sums are those of `foldBom`); the other rows are kept. A
 * change in the number of lists (a line added or taken away) tallies everything again.
 */
interface Tally {
  first: BomEntry | undefined;
  quantity: number;
  cuts: number;
  /** True when a line started or stopped using the row: its line ids are collected again. */
  moved: boolean;
  lineIds: Set<string> | undefined;
}

export class IncrementalBom {
  private lists: ReadonlyArray<readonly BomEntry[]> = [];
  private rows = new Map<Part | string, BomRow>();
  private bom: BillOfMaterials | undefined;

  constructor(private readonly taxRatePercent: number) {}

  update(lists: ReadonlyArray<readonly BomEntry[]>): BillOfMaterials {
    const previous = this.lists;
    this.lists = lists;
    if (!this.bom || previous.length !== lists.length) return this.tallyAll();
    // Every key a changed list had or has; whether the lines using it may have changed.
    const touched = new Map<Part | string, Tally>();
    const touch = (key: Part | string, moved: boolean) => {
      const tally = touched.get(key);
      if (!tally) touched.set(key, { first: undefined, quantity: 0, cuts: 0, moved, lineIds: undefined });
      else if (moved) tally.moved = true;
    };
    for (let i = 0; i < lists.length; i++) {
      const before = previous[i];
      const after = lists[i];
      if (after === before) continue;
      const sameLine = before[0]?.lineId === after[0]?.lineId;
      const had = new Set<Part | string>();
      const has = new Set<Part | string>();
      for (const entry of before) if (entry.lineId) had.add(entry.key);
      for (const entry of after) if (entry.lineId) has.add(entry.key);
      for (const entry of before) touch(entry.key, !sameLine || had.has(entry.key) !== has.has(entry.key));
      for (const entry of after) touch(entry.key, !sameLine || had.has(entry.key) !== has.has(entry.key));
    }
    if (touched.size === 0) return this.bom;
    for (const [key, tally] of touched) if (tally.moved || !this.rows.has(key)) tally.lineIds = new Set();
    // One pass in list order: the sums come out as foldBom's.
    for (const list of lists) {
      for (const entry of list) {
        const tally = touched.get(entry.key);
        if (!tally) continue;
        tally.first ??= entry;
        tally.quantity += entry.quantity;
        if (entry.cut) tally.cuts += 1;
        if (tally.lineIds && entry.lineId) tally.lineIds.add(entry.lineId);
      }
    }
    for (const [key, tally] of touched) {
      if (!tally.first) {
        this.rows.delete(key);
        continue;
      }
      const lineIds = tally.lineIds ? [...tally.lineIds].sort() : this.rows.get(key)!.lineIds;
      this.rows.set(key, bomRow(tally.first, tally.quantity, tally.cuts, lineIds));
    }
    this.bom = finishBom([...this.rows.values()], this.taxRatePercent);
    return this.bom;
  }

  private tallyAll(): BillOfMaterials {
    const byKey = new Map<Part | string, BomEntry[]>();
    for (const list of this.lists) {
      for (const entry of list) {
        const entries = byKey.get(entry.key);
        if (entries) entries.push(entry);
        else byKey.set(entry.key, [entry]);
      }
    }
    this.rows = new Map();
    for (const [key, entries] of byKey) this.rows.set(key, tallyBomRows([entries])[0]);
    this.bom = finishBom([...this.rows.values()], this.taxRatePercent);
    return this.bom;
  }
}
