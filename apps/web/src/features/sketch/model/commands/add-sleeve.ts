import { byId, command, newId } from './command';

export interface AddSleeveArgs {
  lineId: string;
  startIn: number;
  endIn: number;
  partId?: string | null;
  id?: string;
}

export const addSleeve = command<AddSleeveArgs>('Add sleeve', (draft, { lineId, startIn, endIn, partId = null, id }) => {
  if (!(endIn > startIn) || startIn < 0) throw new RangeError('A sleeve must end after it starts');
  const line = byId(draft.lines, lineId, 'line');
  line.sleeves.push({ id: id ?? newId(), startIn, endIn, partId });
  line.sleeves.sort((a, b) => a.startIn - b.startIn);
});
