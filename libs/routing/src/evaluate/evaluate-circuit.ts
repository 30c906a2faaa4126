import type { Part } from '@linesmith/catalog';
import { billOfMaterials } from '../bom/bill-of-materials.js';
import type { BillOfMaterials } from '../bom/bom-row.js';
import type { CircuitDocument } from '../circuit/document.schema.js';
import { pxPerIn as scaleOf } from '../geometry/units.js';
import { analyseLine, portKey, type LineAnalysis } from '../lines/analyse-line.js';
import { cachedMate } from '../lines/end-stack.js';
import { prepareZones, type PreparedZones } from '../lines/heat.js';
import type { LineReport } from '../lines/line-report.js';
import type { PortEntry } from '../lines/port-entry.js';
import { portPosition } from '../lines/port-position.js';
import { compareFlags, type Flag } from '../rules/flag.js';
import { ruleRegistry } from '../rules/registry.js';
import type { RuleContext } from '../rules/rule.js';
import type { ShopRules } from '../rules/shop-rules.js';

export interface CircuitEvaluation {
  lines: LineReport[];
  flags: Flag[];
  bom: BillOfMaterials;
}

/** The sketch scale in px per inch, or null when it is missing or unusable. */
export function usableScaleOf(doc: CircuitDocument): number | null {
  const pxPerIn = doc.calibration ? scaleOf(doc.calibration) : null;
  return pxPerIn !== null && Number.isFinite(pxPerIn) && pxPerIn > 0 ? pxPerIn : null;
}

/** The circuit's heat zones in inches with their clearances; none without a scale. */
export function prepareDocZones(doc: CircuitDocument, rules: ShopRules, usableScale: number | null): PreparedZones {
  // Without a scale the zones cannot be placed in inches; scale-missing then says the heat check did not run.
  return prepareZones(
    usableScale === null
      ? []
      : doc.heatZones.map((z) => ({
          id: z.id,
          polygon: z.polygon.map((p) => ({ x: p.x / usableScale, y: p.y / usableScale })),
          clearanceIn: z.clearanceIn ?? rules.heatClearanceIn[z.kind],
        })),
  );
}

/** Builds the shared context once: ports, scale, and every line worked out. */
export function buildRuleContext(doc: CircuitDocument, parts: readonly Part[], rules: ShopRules): RuleContext {
  const partsById = new Map(parts.map((p) => [p.id, p]));
  const ports = new Map<string, PortEntry>();
  for (const unit of doc.units) {
    for (const port of unit.ports) {
      const key = portKey(unit.id, port.id);
      if (!ports.has(key)) ports.set(key, { key, unit, port, positionPx: portPosition(unit, port) });
    }
  }
  const usableScale = usableScaleOf(doc);
  const zones = prepareDocZones(doc, rules, usableScale);
  const mate = cachedMate();
  const clamps = parts.filter((p) => p.kind === 'clamp' && !p.retired);
  const env = { parts: partsById, clamps, rules, pxPerIn: usableScale, zones, ports, mate };
  const lines: LineAnalysis[] = doc.lines.map((line) => analyseLine(line, env));
  const lineByPort = new Map<string, LineAnalysis>();
  for (const line of lines) {
    lineByPort.set(portKey(line.line.from.unitId, line.line.from.portId), line);
    lineByPort.set(portKey(line.line.to.unitId, line.line.to.portId), line);
  }
  return { doc, rules, parts: partsById, pxPerIn: usableScale, ports, lines, lineByPort, mate };
}

/**
 * Checks a circuit: per-line reports, flags in a stable order (severity, then target), and the
 * bill of materials. Never throws on a document that passed `circuitDocumentSchema`: unknown
 * part ids become flags.
 */
export interface EvaluateOptions {
  /** The shop's sales tax rate (the shop profile owns it); 0 when omitted. */
  taxRatePercent?: number;
}

export function evaluateCircuit(
  doc: CircuitDocument,
  parts: readonly Part[],
  shopRules: ShopRules,
  options: EvaluateOptions = {},
): CircuitEvaluation {
  const ctx = buildRuleContext(doc, parts, shopRules);
  const flags = ruleRegistry.flatMap((rule) => rule.check(ctx)).sort(compareFlags);
  const bom = billOfMaterials({
    lines: ctx.lines,
    ports: ctx.ports.values(),
    connectedPorts: new Set(ctx.lineByPort.keys()),
    parts: ctx.parts,
    rules: shopRules,
    taxRatePercent: options.taxRatePercent ?? 0,
    seals: { fluid: doc.circuit.fluid, maxTempF: doc.circuit.maxTempF },
  });
  return { lines: ctx.lines.map((l) => l.report), flags, bom };
}
