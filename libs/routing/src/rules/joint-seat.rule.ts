import { jointFlags } from './joint-flags.js';
import type { Rule } from './rule.js';

export const jointSeatRule: Rule = {
  code: 'joint-seat',
  severity: 'blocker',
  title: 'Threads engage, seats differ',
  description:
    'Two ends whose threads screw together but whose sealing seats differ (for example a 37° flare into a 45° flare at -4, or a 37° flare male into an O-ring boss port). It tightens up and still leaks.',
  check: (ctx) => jointFlags(ctx, 'joint-seat', 'Use an adapter with the right seat on each side, or a hose end made for this port.'),
};
