import type { Rule } from '../rules/rule.js';

/**
 * Rules whose flags split by item: what they say about a line depends only on that line's
 * analysis (its ports, parts and route) and the circuit's settings, heat zones and shop rules;
 * what they say about an unconnected port depends only on that port, its unit and whether a line
 * is on it. For these the incremental evaluator re-runs a rule on the changed lines and units
 * only (with `ctx.lines` and `ctx.ports` narrowed to them) and keeps the other flags.
 *
 * Any rule not listed here (a rule that walks the circuit as a graph or counts over all lines,
 * and any rule added later) is run over the whole circuit on every evaluation: slower, never
 * wrong. Add a rule here only when it reads nothing else; the property test in
 * create-evaluator.test.ts compares incremental and full evaluation on random edits.
 */
const BY_ITEM = new Set([
  'joint-seat',
  'joint-thread',
  'joint-gender',
  'port-requirement',
  'hose-end-size',
  'rating-pressure',
  'rating-temperature',
  'fluid',
  'bend-radius',
  'bend-near-socket',
  'free-hose-length',
  'measured-length',
  'heat-contact',
  'heat-sleeve',
  'support-gap',
  'restriction',
  'open-port',
  'no-slack',
  'incomplete-line',
  'missing-part',
]);

export const splitsByItem = (rule: Rule): boolean => BY_ITEM.has(rule.code);
