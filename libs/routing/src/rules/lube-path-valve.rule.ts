import type { LineAnalysis } from '../lines/analyse-line.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule, type RuleContext } from './rule.js';

/**
 * From a valve unit, walks the circuit line by line (in both directions: the sketch does not fix
 * the flow direction) and returns the line leaving the valve on a path to a port that feeds
 * lubrication, with that port's name.
 */
function pathToLubrication(ctx: RuleContext, valveId: string): { first: LineAnalysis; port: string } | undefined {
  const linesByUnit = new Map<string, LineAnalysis[]>();
  for (const line of ctx.lines) {
    for (const unitId of [line.line.from.unitId, line.line.to.unitId]) {
      const list = linesByUnit.get(unitId) ?? [];
      list.push(line);
      linesByUnit.set(unitId, list);
    }
  }
  const visited = new Set<string>([valveId]);
  const queue: Array<{ unitId: string; first: LineAnalysis | undefined }> = [{ unitId: valveId, first: undefined }];
  const usedLines = new Set<string>();
  while (queue.length > 0) {
    const { unitId, first } = queue.shift()!;
    for (const line of linesByUnit.get(unitId) ?? []) {
      if (usedLines.has(line.line.id)) continue;
      usedLines.add(line.line.id);
      const viaFirst = first ?? line;
      for (const entry of [line.from, line.to]) {
        if (entry?.port.feedsLubrication && entry.unit.id !== valveId) {
          return { first: viaFirst, port: `${entry.unit.label || entry.unit.id} ${entry.port.label || entry.port.id}` };
        }
      }
      const next = line.line.from.unitId === unitId ? line.line.to.unitId : line.line.from.unitId;
      if (!visited.has(next)) {
        visited.add(next);
        queue.push({ unitId: next, first: viaFirst });
      }
    }
  }
  return undefined;
}

/** What a valve of this kind does and what its failure does to the path, in shop words. */
function failureWords(valveKind: string, lubePort: string): string {
  if (/thermostat|bypass/i.test(valveKind)) {
    return (
      `a thermostatic bypass normally passes flow at every temperature — round the cooler while the fluid is cold, through it once warm. ` +
      `If it sticks in bypass the fluid reaching ${lubePort} goes uncooled; if it sticks shut or clogs it blocks the cooler path, and ${lubePort} gets less flow or none.`
    );
  }
  return `if it sticks shut or clogs, the path to ${lubePort} gets less flow or none; if it sticks open the circuit runs as if it were not there.`;
}

export const lubePathValveRule: Rule = {
  code: 'lube-path-valve',
  severity: 'caution',
  title: 'Valve in a lubrication path',
  description:
    'A valve (for example a thermostatic bypass) in a circuit whose fluid goes on to lubricate a gear train. Such a valve normally passes flow all the time; the risk is its failure: stuck in bypass, the fluid returns uncooled; stuck shut or clogged, it blocks the cooler path and the lubrication downstream gets less flow or none. Common practice is to keep such paths free of valves, or to use one whose maker allows it in this place.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const unit of ctx.doc.units) {
      if (!unit.valveKind) continue;
      const found = pathToLubrication(ctx, unit.id);
      if (!found) continue;
      flags.push({
        code: 'lube-path-valve',
        severity: 'caution',
        message: `${unit.label || unit.id} (${unit.valveKind}) sits in the path to ${found.port}, which feeds lubrication: ${failureWords(unit.valveKind, found.port)}`,
        target: lineTarget(found.first.line.id),
        fix: 'Move the valve out of the lubrication path, use a valve whose maker allows it here (one that fails to the bypass side), or have the reviewer confirm it.',
      });
    }
    return flags;
  },
};
