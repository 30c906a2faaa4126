import { byId, command } from './command';

export const removeSupport = command<{ lineId: string; supportId: string }>('Remove support', (draft, { lineId, supportId }) => {
  const line = byId(draft.lines, lineId, 'line');
  line.supports = line.supports.filter((s) => s.id !== supportId);
});
