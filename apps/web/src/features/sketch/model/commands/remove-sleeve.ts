import { byId, command } from './command';

export const removeSleeve = command<{ lineId: string; sleeveId: string }>('Remove sleeve', (draft, { lineId, sleeveId }) => {
  const line = byId(draft.lines, lineId, 'line');
  line.sleeves = line.sleeves.filter((s) => s.id !== sleeveId);
});
