import { command } from './command';

export const deleteLine = command<{ lineId: string }>('Delete line', (draft, { lineId }) => {
  draft.lines = draft.lines.filter((l) => l.id !== lineId);
});
