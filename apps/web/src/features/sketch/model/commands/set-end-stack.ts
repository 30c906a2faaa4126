import type { LineEnd } from '@linesmith/routing';
import { byId, command } from './command';

export interface SetEndStackArgs {
  lineId: string;
  end: LineEnd;
  /** Part ids from the port outward: adapters, then the hose end last. */
  partIds: string[];
}

export const setEndStack = command<SetEndStackArgs>('Set end stack', (draft, { lineId, end, partIds }) => {
  byId(draft.lines, lineId, 'line').endStacks[end] = [...partIds];
});
