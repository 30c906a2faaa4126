import type { CircuitPort } from '@linesmith/routing';
import { byId, command } from './command';

export interface UpdatePortArgs {
  unitId: string;
  portId: string;
  changes: Partial<Pick<CircuitPort, 'label' | 'role' | 'dx' | 'dy' | 'feedsLubrication' | 'plugPartId'>> & {
    /** null removes the requirement. */
    requirement?: CircuitPort['requirement'] | null;
    /** Port depth limits in inches; null removes one. */
    threadDepthIn?: number | null;
    passageDepthIn?: number | null;
    minReachIn?: number | null;
  };
}

/** Edits a port's label, role, offset, lubrication flag, plug or requirement. */
export const updatePort = command<UpdatePortArgs>('Edit port', (draft, { unitId, portId, changes }) => {
  const port = byId(byId(draft.units, unitId, 'unit').ports, portId, 'port');
  const { requirement, threadDepthIn, passageDepthIn, minReachIn, ...rest } = changes;
  Object.assign(port, rest);
  for (const [key, value] of [
    ['threadDepthIn', threadDepthIn],
    ['passageDepthIn', passageDepthIn],
    ['minReachIn', minReachIn],
  ] as const) {
    if (value === null) delete port[key];
    else if (value !== undefined) {
      if (!(value > 0)) throw new RangeError('A port depth is more than 0 in');
      port[key] = value;
    }
  }
  if (requirement === null) delete port.requirement;
  else if (requirement !== undefined) port.requirement = requirement;
  if (changes.feedsLubrication === false) delete port.feedsLubrication;
});
