import { byId, command } from './command';

export interface DeletePortArgs {
  unitId: string;
  portId: string;
}

/** Removes a port and the line that ends on it. */
export const deletePort = command<DeletePortArgs>('Delete port', (draft, { unitId, portId }) => {
  const unit = byId(draft.units, unitId, 'unit');
  unit.ports = unit.ports.filter((p) => p.id !== portId);
  const onPort = (ref: { unitId: string; portId: string }) => ref.unitId === unitId && ref.portId === portId;
  draft.lines = draft.lines.filter((l) => !onPort(l.from) && !onPort(l.to));
});
