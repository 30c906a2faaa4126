import { jointFlags } from './joint-flags.js';
import type { Rule } from './rule.js';

export const jointThreadRule: Rule = {
  code: 'joint-thread',
  severity: 'blocker',
  title: 'Threads differ',
  description:
    'Two ends with different threads. Some look alike (1/4 NPT and 9/16-18 both have 18 threads per inch): forcing them strips the threads or leaks.',
  check: (ctx) => jointFlags(ctx, 'joint-thread', 'Check both threads with a gauge and fit an adapter between them.'),
};
