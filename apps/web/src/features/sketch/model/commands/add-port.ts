import type { CircuitPort } from '@linesmith/routing';
import { byId, command, newId } from './command';

export interface AddPortArgs {
  unitId: string;
  port?: Partial<Omit<CircuitPort, 'id'>>;
  id?: string;
}

/** Adds a port to a unit; a new port starts as a -6 O-ring boss female outlet on the unit's centre. */
export const addPort = command<AddPortArgs>('Add port', (draft, { unitId, port = {}, id }) => {
  const unit = byId(draft.units, unitId, 'unit');
  unit.ports.push({
    id: id ?? newId(),
    label: port.label ?? `Port ${unit.ports.length + 1}`,
    role: port.role ?? 'out',
    connection: port.connection ?? { family: 'orb', size: '-6', gender: 'female' },
    dx: port.dx ?? 0,
    dy: port.dy ?? 0,
    ...(port.requirement ? { requirement: port.requirement } : {}),
    ...(port.feedsLubrication ? { feedsLubrication: true } : {}),
  });
});
