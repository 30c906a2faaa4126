import type { Part } from '@linesmith/catalog';
import { lineBomEntries, portBomEntries, sealCatalogueOf, type BomEntry } from '../bom/bill-of-materials.js';
import type { CircuitDocument, CircuitLine, CircuitUnit } from '../circuit/document.schema.js';
import { analyseLine, portKey, type LineAnalysis, type LineEnvironment } from '../lines/analyse-line.js';
import { cachedMate } from '../lines/end-stack.js';
import type { PreparedZones } from '../lines/heat.js';
import type { PortEntry } from '../lines/port-entry.js';
import { portPosition } from '../lines/port-position.js';
import { compareFlags, type Flag } from '../rules/flag.js';
import { ruleRegistry } from '../rules/registry.js';
import type { Rule, RuleContext } from '../rules/rule.js';
import type { ShopRules } from '../rules/shop-rules.js';
import { evaluateCircuit, prepareDocZones, usableScaleOf, type CircuitEvaluation, type EvaluateOptions } from './evaluate-circuit.js';
import { IncrementalBom } from './incremental-bom.js';
import { splitsByItem } from './rule-scopes.js';

/**
 * An evaluator that remembers its last evaluation: `evaluate(doc)` gives exactly what
 * `evaluateCircuit(doc, parts, rules, options)` gives, but re-works only the lines and units that
 * changed since the previous document. A line is unchanged when it is the same object as before
 * (the editor's commands share untouched objects) or has the same content, and so are the units
 * at its two ends; a unit when it is the same or equal. A change of scale, heat zones or circuit
 * settings starts afresh. Flags of the rules that split by item (rule-scopes.ts) are kept per line
 * and per unit; the other rules run over the whole circuit each time.
 */
export interface CircuitEvaluator {
  evaluate(doc: CircuitDocument): CircuitEvaluation;
  /** How many lines the last evaluation worked out again (for tests and benchmarks). */
  readonly lastReworkedLines: number;
}

interface UnitChunk {
  unit: CircuitUnit;
  /** The unit's ports, first of each id. */
  entries: PortEntry[];
  /** Per port when `flags` and `bom` were worked out: '0' another unit's port has its key, '1' open or plugged, '2' a line on it. */
  connected: string | undefined;
  flags: Flag[];
  bom: BomEntry[];
}

interface LineChunk {
  line: CircuitLine;
  fromKey: string;
  toKey: string;
  from: PortEntry | undefined;
  to: PortEntry | undefined;
  analysis: LineAnalysis;
  flags: Flag[] | undefined;
  bom: BomEntry[];
}

const EMPTY_PORTS: ReadonlyMap<string, PortEntry> = new Map();

/** Same object, or the same plain-data content (documents are JSON data); stops at the first difference. */
function same(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a)) {
    if (!Array.isArray(b) || a.length !== b.length) return false;
    for (let i = 0; i < a.length; i++) if (!same(a[i], b[i])) return false;
    return true;
  }
  if (Array.isArray(b)) return false;
  const ka = Object.keys(a);
  if (ka.length !== Object.keys(b).length) return false;
  for (const k of ka) if (!same((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k])) return false;
  return true;
}

/** Where `flag` (an element of `sorted`) sits in it: the first of its equals, then by identity. */
function indexOf(sorted: readonly Flag[], flag: Flag): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (compareFlags(sorted[mid], flag) < 0) lo = mid + 1;
    else hi = mid;
  }
  for (let i = lo; i < sorted.length; i++) if (sorted[i] === flag) return i;
  return sorted.indexOf(flag);
}

/** Index of the first element of `sorted` that orders after `flag` (after its equals). */
function upperBound(sorted: readonly Flag[], flag: Flag): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (compareFlags(sorted[mid], flag) <= 0) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

export function createEvaluator(parts: readonly Part[], shopRules: ShopRules, options: EvaluateOptions = {}): CircuitEvaluator {
  const partsById = new Map(parts.map((p) => [p.id, p]));
  const clamps = parts.filter((p) => p.kind === 'clamp' && !p.retired);
  // Seals are picked for the circuit's fluid and temperature: worked out again when they change.
  let sealCatalogue = sealCatalogueOf(partsById);
  const taxRatePercent = options.taxRatePercent ?? 0;
  const byItem = ruleRegistry.filter(splitsByItem);
  const wholeCircuit = ruleRegistry.filter((r) => !splitsByItem(r));

  let lastDoc: CircuitDocument | undefined;
  let lastResult: CircuitEvaluation | undefined;
  /** What every line depends on besides its own content and its two units. */
  let setting: { calibration: unknown; heatZones: unknown; circuit: unknown } | undefined;
  let zones: PreparedZones | undefined;
  let scale: number | null = null;
  let units = new Map<string, UnitChunk>();
  let lines = new Map<string, LineChunk>();
  /** The last document's lines, in its order. */
  let lineOrder: LineChunk[] = [];
  let lastUnits: CircuitDocument['units'] | undefined;
  let lastPorts = new Map<string, PortEntry>();
  let sortedFlags: Flag[] = [];
  let wholeFlags: Flag[] = [];
  let lineByPort = new Map<string, LineAnalysis>();
  /** True when two lines of the last document claimed one port (only a document the schema refuses). */
  let claimsCollide = false;
  let bom = new IncrementalBom(taxRatePercent);
  let reworked = 0;

  const reset = () => {
    lastDoc = lastResult = setting = zones = lastUnits = undefined;
    units = new Map();
    lines = new Map();
    lineOrder = [];
    lastPorts = new Map();
    sortedFlags = [];
    wholeFlags = [];
    lineByPort = new Map();
    claimsCollide = false;
    bom = new IncrementalBom(taxRatePercent);
  };

  const settingsOf = (doc: CircuitDocument) => ({ calibration: doc.calibration, heatZones: doc.heatZones, circuit: doc.circuit });

  function full(doc: CircuitDocument): CircuitEvaluation {
    reset();
    reworked = doc.lines.length;
    return evaluateCircuit(doc, parts, shopRules, options);
  }

  function evaluate(doc: CircuitDocument): CircuitEvaluation {
    if (doc === lastDoc && lastResult) {
      reworked = 0;
      return lastResult;
    }
    const now = settingsOf(doc);
    const previous = setting;
    const settled =
      previous !== undefined &&
      same(previous.calibration, now.calibration) &&
      same(previous.heatZones, now.heatZones) &&
      same(previous.circuit, now.circuit);
    if (!settled) {
      reset();
      scale = usableScaleOf(doc);
      zones = prepareDocZones(doc, shopRules, scale);
      sealCatalogue = sealCatalogueOf(partsById, { fluid: doc.circuit.fluid, maxTempF: doc.circuit.maxTempF });
    }
    setting = now;
    const fresh = !settled;

    // Units and their ports, reusing the entries of unchanged units.
    const nextUnits = new Map<string, UnitChunk>();
    let portsChanged = doc.units !== lastUnits || fresh;
    for (const unit of doc.units) {
      // An id repeated (a document the schema refuses): the whole-circuit path knows what to do.
      if (nextUnits.has(unit.id)) return full(doc);
      const chunk = units.get(unit.id);
      if (chunk && same(chunk.unit, unit)) {
        if (chunk.unit !== unit) chunk.unit = unit; // equal content: keep the entries already worked out
        nextUnits.set(unit.id, chunk);
        continue;
      }
      portsChanged = true;
      const seen = new Set<string>();
      const entries: PortEntry[] = [];
      for (const port of unit.ports) {
        const key = portKey(unit.id, port.id);
        if (seen.has(key)) continue;
        seen.add(key);
        entries.push({ key, unit, port, positionPx: portPosition(unit, port) });
      }
      nextUnits.set(unit.id, { unit, entries, connected: undefined, flags: [], bom: [] });
    }
    if (nextUnits.size !== units.size) portsChanged = true;
    let ports = lastPorts;
    if (portsChanged) {
      ports = new Map();
      for (const chunk of nextUnits.values()) for (const entry of chunk.entries) if (!ports.has(entry.key)) ports.set(entry.key, entry);
    }

    // Lines: work out again only those whose content or whose ports changed.
    const mate = cachedMate();
    const env: LineEnvironment = { parts: partsById, clamps, rules: shopRules, pxPerIn: scale, zones: zones!, ports, mate };
    const order: LineChunk[] = [];
    const analyses: LineAnalysis[] = [];
    const removed = new Set<Flag>();
    const changedLines: LineChunk[] = [];
    /** Chunks replaced or gone: their port claims come out of lineByPort. */
    const retired: LineChunk[] = [];
    const touchedUnits = new Set<string>();
    // While the ids run as before, each line is matched by its place: no lookups for untouched lines.
    let inPlace = doc.lines.length === lineOrder.length;
    for (let i = 0; i < doc.lines.length; i++) {
      const line = doc.lines[i];
      let chunk = inPlace && lineOrder[i].line.id === line.id ? lineOrder[i] : undefined;
      if (!chunk) {
        inPlace = false;
        chunk = lines.get(line.id);
      }
      if (chunk && chunk.line === line && !portsChanged) {
        order.push(chunk);
        analyses.push(chunk.analysis);
        continue;
      }
      const unchanged = chunk && same(chunk.line, line);
      const fromKey = unchanged ? chunk!.fromKey : portKey(line.from.unitId, line.from.portId);
      const toKey = unchanged ? chunk!.toKey : portKey(line.to.unitId, line.to.portId);
      const from = ports.get(fromKey);
      const to = ports.get(toKey);
      if (!chunk || !unchanged || chunk.from !== from || chunk.to !== to) {
        if (chunk?.flags) for (const flag of chunk.flags) removed.add(flag);
        if (chunk) retired.push(chunk);
        touchedUnits.add(line.from.unitId).add(line.to.unitId);
        const analysis = analyseLine(line, env);
        chunk = { line, fromKey, toKey, from, to, analysis, flags: undefined, bom: lineBomEntries(analysis, partsById, shopRules, sealCatalogue) };
        changedLines.push(chunk);
      } else if (chunk.line !== line) {
        chunk.line = line;
      }
      order.push(chunk);
      analyses.push(chunk.analysis);
    }
    if (inPlace) {
      for (const chunk of changedLines) lines.set(chunk.line.id, chunk);
    } else {
      // Lines added, taken away or reordered: index them again (an id repeated goes the whole-circuit way).
      const nextLines = new Map<string, LineChunk>();
      for (const chunk of order) {
        if (nextLines.has(chunk.line.id)) return full(doc);
        nextLines.set(chunk.line.id, chunk);
      }
      for (const [id, chunk] of lines) {
        if (nextLines.get(id) === chunk) continue;
        if (!retired.includes(chunk)) retired.push(chunk);
        if (chunk.flags) for (const flag of chunk.flags) removed.add(flag);
      }
      lines = nextLines;
    }
    for (const [id, chunk] of units) if (nextUnits.get(id) !== chunk) for (const flag of chunk.flags) removed.add(flag);
    reworked = changedLines.length;

    // The line on each port: patched for the changed lines, built afresh when claims collide.
    let patched = !fresh && !claimsCollide;
    if (patched) {
      for (const chunk of retired) {
        touchedUnits.add(chunk.line.from.unitId).add(chunk.line.to.unitId);
        if (lineByPort.get(chunk.fromKey) === chunk.analysis) lineByPort.delete(chunk.fromKey);
        if (lineByPort.get(chunk.toKey) === chunk.analysis) lineByPort.delete(chunk.toKey);
      }
      for (const chunk of changedLines) {
        if (lineByPort.has(chunk.fromKey) || lineByPort.has(chunk.toKey) || chunk.fromKey === chunk.toKey) {
          patched = false;
          break;
        }
        lineByPort.set(chunk.fromKey, chunk.analysis);
        lineByPort.set(chunk.toKey, chunk.analysis);
      }
    }
    if (!patched) {
      lineByPort = new Map();
      claimsCollide = false;
      for (const chunk of order) {
        if (lineByPort.has(chunk.fromKey)) claimsCollide = true;
        lineByPort.set(chunk.fromKey, chunk.analysis);
        if (lineByPort.has(chunk.toKey)) claimsCollide = true;
        lineByPort.set(chunk.toKey, chunk.analysis);
      }
    }
    const everyUnit = !patched || portsChanged;
    const ctx: RuleContext = { doc, rules: shopRules, parts: partsById, pxPerIn: scale, ports, lines: analyses, lineByPort, mate };
    const runAll = (rules: readonly Rule[], narrowed: RuleContext) => {
      const flags: Flag[] = [];
      for (const rule of rules) for (const flag of rule.check(narrowed)) flags.push(flag);
      return flags;
    };

    const added: Flag[] = [];
    for (const chunk of changedLines) {
      chunk.flags = runAll(byItem, { ...ctx, lines: [chunk.analysis], ports: EMPTY_PORTS });
      for (const flag of chunk.flags) added.push(flag);
    }
    // Unconnected ports: their flags and plugs, per unit, again when the unit or its lines changed.
    for (const chunk of nextUnits.values()) {
      if (!everyUnit && chunk.connected !== undefined && !touchedUnits.has(chunk.unit.id)) continue;
      let connected = '';
      for (const entry of chunk.entries) connected += ports.get(entry.key) !== entry ? '0' : lineByPort.has(entry.key) ? '2' : '1';
      if (chunk.connected === connected) continue;
      for (const flag of chunk.flags) removed.add(flag);
      const own = new Map<string, PortEntry>();
      for (const entry of chunk.entries) if (ports.get(entry.key) === entry) own.set(entry.key, entry);
      chunk.flags = runAll(byItem, { ...ctx, lines: [], ports: own });
      chunk.bom = [];
      for (const entry of own.values()) for (const row of portBomEntries(entry, lineByPort.has(entry.key), partsById, sealCatalogue)) chunk.bom.push(row);
      chunk.connected = connected;
      for (const flag of chunk.flags) added.push(flag);
    }
    for (const flag of wholeFlags) removed.add(flag);
    wholeFlags = runAll(wholeCircuit, ctx);
    for (const flag of wholeFlags) added.push(flag);

    // Flags in the order evaluateCircuit gives: take out the replaced ones, put the new ones in place.
    let flags: Flag[];
    if (added.length > 64 && added.length * 8 > sortedFlags.length) {
      flags = sortedFlags.filter((f) => !removed.has(f)).concat(added).sort(compareFlags);
    } else {
      // Positions in the last list: where each old flag leaves and where each new one goes in (after its equals).
      const drops: number[] = [];
      for (const flag of removed) drops.push(indexOf(sortedFlags, flag));
      drops.sort((a, b) => a - b);
      added.sort(compareFlags);
      const pieces: Flag[][] = [];
      let from = 0;
      let d = 0;
      const keepUpTo = (end: number) => {
        for (; d < drops.length && drops[d] < end; d++) {
          if (drops[d] > from) pieces.push(sortedFlags.slice(from, drops[d]));
          from = drops[d] + 1;
        }
        if (end > from) pieces.push(sortedFlags.slice(from, end));
        from = Math.max(from, end);
      };
      for (let a = 0; a < added.length; ) {
        const at = upperBound(sortedFlags, added[a]);
        keepUpTo(at);
        const run: Flag[] = [];
        while (a < added.length && upperBound(sortedFlags, added[a]) === at) run.push(added[a++]);
        pieces.push(run);
      }
      keepUpTo(sortedFlags.length);
      flags = pieces.length === 1 ? pieces[0] : ([] as Flag[]).concat(...pieces);
    }

    const bomLists: BomEntry[][] = [];
    for (const chunk of order) bomLists.push(chunk.bom);
    for (const chunk of nextUnits.values()) bomLists.push(chunk.bom);
    const result: CircuitEvaluation = { lines: analyses.map((a) => a.report), flags, bom: bom.update(bomLists) };

    units = nextUnits;
    lineOrder = order;
    lastUnits = doc.units;
    lastPorts = ports;
    sortedFlags = flags;
    lastDoc = doc;
    lastResult = result;
    return result;
  }

  return {
    evaluate,
    get lastReworkedLines() {
      return reworked;
    },
  };
}
