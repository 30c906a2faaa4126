import type { PlacedSleeve, SleeveProblem } from '../lines/line-report.js';
import { formatInches } from '../units/length-format.js';
import type { Flag } from './flag.js';
import { lineTarget, type Rule } from './rule.js';

const PROBLEM_WORDS: Readonly<Record<SleeveProblem, string>> = {
  'no-part': 'has no sleeve part',
  missing: 'names a part the catalogue does not hold',
  'not-a-sleeve': 'names a part that is not a sleeve',
  'does-not-fit': 'is a sleeve made for another hose size',
  'no-hose': 'is on a line without a hose, so its fit cannot be checked',
};

const sleeveWords = (s: PlacedSleeve) => `sleeve ${s.id} ${PROBLEM_WORDS[s.problem ?? 'no-part']}`;

export const heatSleeveRule: Rule = {
  code: 'heat-sleeve',
  severity: 'caution',
  title: 'Near heat without a sleeve',
  description:
    'Where a route passes within the shop’s clearance of a heat zone, that stretch needs a fire sleeve, running past each end by the shop’s overlap. Only a catalogue sleeve that fits the hose’s outside diameter counts as cover; a sleeve drawn without such a part leaves the stretch bare.',
  check(ctx) {
    const flags: Flag[] = [];
    for (const line of ctx.lines) {
      const uncovered = line.report.sleeves.uncoveredIn;
      const notCounted = line.report.sleeves.placed.filter((s) => !s.covers);
      if (uncovered.length === 0 && notCounted.length === 0) continue;
      const sentences: string[] = [];
      if (uncovered.length > 0) {
        const stretches = uncovered.map((i) => `${formatInches(i.start)}–${formatInches(i.end)} in`).join(', ');
        sentences.push(`Unsleeved near heat at ${stretches} from the ${line.from?.port.label || 'from'} end.`);
      }
      if (notCounted.length > 0) {
        const list = notCounted.map(sleeveWords).join('; ');
        sentences.push(`Not counted as heat cover: ${list}.`);
      }
      const planned = line.report.sleeves.plannedIn.map((i) => `${formatInches(i.start)}–${formatInches(i.end)} in`).join(', ');
      const fixes: string[] = [];
      if (notCounted.length > 0) fixes.push('Pick a sleeve part from the catalogue that fits the hose’s outside diameter for each sleeve.');
      if (uncovered.length > 0) fixes.push(`Add a fire sleeve over ${planned}, or reroute further from the heat.`);
      flags.push({
        code: 'heat-sleeve',
        severity: 'caution',
        message: sentences.join(' '),
        target: lineTarget(line.line.id),
        fix: fixes.join(' '),
      });
    }
    return flags;
  },
};
