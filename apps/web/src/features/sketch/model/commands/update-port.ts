import type { CircuitPort } from '@linesmith/routing';
import { byId, command } from './command';

export interface UpdatePortArgs {
  unitId: string;
  portId: string;
  changes: Partial<Pick<CircuitPort, 'label' | 'role' | 'dx' | 'dy' | 'feedsLubrication' | 'plugPartId'>> & {
    /** null removes the requirement. */
    requirement?: CircuitPort['requirement'] | null;
  };
}

/** Edits a port's label, role, offset, lubrication flag, plug or requirement. */
export const updatePort = command<UpdatePortArgs>('Edit port', (draft, { unitId, portId, changes }) => {
  const port = byId(byId(draft.units, unitId, 'unit').ports, portId, 'port');
  const { requirement, ...rest } = changes;
  Object.assign(port, rest);
  if (requirement === null) delete port.requirement;
  else if (requirement !== undefined) port.requirement = requirement;
  if (changes.feedsLubrication === false) delete port.feedsLubrication;
});
