import { byId, command } from './command';

/** Picks the line's hose part (null clears it). End stacks stay; the rules flag hose ends that no longer fit. */
export const setHose = command<{ lineId: string; hosePartId: string | null }>('Set hose', (draft, { lineId, hosePartId }) => {
  byId(draft.lines, lineId, 'line').hosePartId = hosePartId;
});
