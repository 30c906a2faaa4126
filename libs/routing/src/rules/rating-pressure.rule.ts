import type { Part } from '@linesmith/catalog';
import type { Flag } from './flag.js';
import { lineTarget, partName, type Rule } from './rule.js';

/** The rated pressure of a part that carries the fluid, when the catalogue gives one. */
function ratedPsi(part: Part): number | undefined {
  switch (part.kind) {
    case 'hose':
    case 'hose-end':
    case 'adapter':
    case 'bulkhead':
      return part.attributes.maxPressurePsi;
    default:
      return undefined;
  }
}

export const ratingPressureRule: Rule = {
  code: 'rating-pressure',
  severity: 'blocker',
  title: 'Rated below the circuit pressure',
  description:
    'Every hose and fitting in a line must be rated for at least the circuit’s highest pressure. Relieve pressure before opening any line, and follow the makers’ ratings.',
  check(ctx) {
    const flags: Flag[] = [];
    const need = ctx.doc.circuit.maxPressurePsi;
    for (const line of ctx.lines) {
      const parts = [line.hose, ...line.stacks.from.items.map((i) => i.part), ...line.stacks.to.items.map((i) => i.part)];
      const seen = new Set<string>();
      for (const part of parts) {
        if (!part || seen.has(part.id)) continue;
        seen.add(part.id);
        const rated = ratedPsi(part);
        if (rated === undefined || rated >= need) continue;
        flags.push({
          code: 'rating-pressure',
          severity: 'blocker',
          message: `${partName(part)} is rated ${rated} psi; the circuit runs up to ${need} psi.`,
          target: lineTarget(line.line.id),
          fix: 'Choose a part rated at or above the circuit pressure.',
        });
      }
    }
    return flags;
  },
};
