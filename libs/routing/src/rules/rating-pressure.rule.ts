import type { Part } from '@linesmith/catalog';
import type { Flag, FlagTarget } from './flag.js';
import { lineTarget, partName, portTarget, type Rule } from './rule.js';

/**
 * The rated pressure of a part that holds the fluid: a number, 'unknown' when the catalogue
 * leaves an adapter, bulkhead or plug unrated, or undefined for parts that hold no pressure.
 */
function ratedPsi(part: Part): number | 'unknown' | undefined {
  switch (part.kind) {
    case 'hose':
    case 'hose-end':
      return part.attributes.maxPressurePsi;
    case 'adapter':
    case 'bulkhead':
    case 'plug':
      return part.attributes.maxPressurePsi ?? 'unknown';
    default:
      return undefined;
  }
}

export const ratingPressureRule: Rule = {
  code: 'rating-pressure',
  severity: 'blocker',
  title: 'Rated below the circuit pressure',
  description:
    'Every hose, fitting and plug in the circuit must be rated for at least the circuit’s highest pressure; a fitting the catalogue gives no rating for is noted so someone checks the maker’s rating. Relieve pressure before opening any line, and follow the makers’ ratings.',
  check(ctx) {
    const flags: Flag[] = [];
    const need = ctx.doc.circuit.maxPressurePsi;
    const checkPart = (part: Part, target: FlagTarget) => {
      const rated = ratedPsi(part);
      if (rated === undefined) return;
      if (rated === 'unknown') {
        if (need > 0) {
          flags.push({
            code: 'rating-pressure',
            severity: 'note',
            message: `${partName(part)}: rating unknown — check the maker’s rating; the circuit runs up to ${need} psi.`,
            target,
            fix: 'Enter the maker’s working pressure on the catalogue part, or choose a rated part.',
          });
        }
        return;
      }
      if (rated >= need) return;
      flags.push({
        code: 'rating-pressure',
        severity: 'blocker',
        message: `${partName(part)} is rated ${rated} psi; the circuit runs up to ${need} psi.`,
        target,
        fix: 'Choose a part rated at or above the circuit pressure.',
      });
    };
    for (const line of ctx.lines) {
      const parts = [line.hose, ...line.stacks.from.items.map((i) => i.part), ...line.stacks.to.items.map((i) => i.part)];
      const seen = new Set<string>();
      for (const part of parts) {
        if (!part || seen.has(part.id)) continue;
        seen.add(part.id);
        checkPart(part, lineTarget(line.line.id));
      }
    }
    for (const entry of ctx.ports.values()) {
      const plug = entry.port.plugPartId ? ctx.parts.get(entry.port.plugPartId) : undefined;
      if (plug?.kind !== 'plug' || ctx.lineByPort.has(entry.key)) continue;
      checkPart(plug, portTarget(entry.unit.id, entry.port.id));
    }
    return flags;
  },
};
