import { byId, command, newId } from './command';

export interface AddSupportArgs {
  lineId: string;
  /** Distance along the line from its from-port, inches. */
  atIn: number;
  id?: string;
}

export const addSupport = command<AddSupportArgs>('Add support', (draft, { lineId, atIn, id }) => {
  if (!(atIn >= 0)) throw new RangeError('A support sits 0 or more inches along the line');
  const line = byId(draft.lines, lineId, 'line');
  line.supports.push({ id: id ?? newId(), atIn });
  line.supports.sort((a, b) => a.atIn - b.atIn);
});
