import type { ConnectionSpec } from '@linesmith/catalog';
import { byId, command } from './command';

export interface SetConnectionSpecArgs {
  unitId: string;
  portId: string;
  connection: ConnectionSpec;
}

/** Sets a port's thread and seat standard, size and gender. */
export const setConnectionSpec = command<SetConnectionSpecArgs>('Set connection', (draft, { unitId, portId, connection }) => {
  byId(byId(draft.units, unitId, 'unit').ports, portId, 'port').connection = { ...connection };
});
