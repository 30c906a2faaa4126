import { jointFlags } from './joint-flags.js';
import type { Rule } from './rule.js';

export const jointGenderRule: Rule = {
  code: 'joint-gender',
  severity: 'blocker',
  title: 'Two males or two females',
  description: 'Both ends of a joint are male, or both are female: one side must be the other gender.',
  check: (ctx) => jointFlags(ctx, 'joint-gender', 'Swap one part for its other-gender version, or add a union between them.'),
};
