import { proposeSupports as evenlySpaced } from '@linesmith/routing';
import { byId, command, newId } from './command';

export interface ProposeSupportsArgs {
  lineId: string;
  /** The line's length as the cut is worked out (measured or drawn), inches. */
  lengthIn: number;
  /** The shop's support spacing, inches. */
  spacingIn: number;
}

/** Replaces the line's supports with the fewest evenly spaced ones that meet the shop's spacing. */
export const proposeSupports = command<ProposeSupportsArgs>('Propose supports', (draft, { lineId, lengthIn, spacingIn }) => {
  byId(draft.lines, lineId, 'line').supports = evenlySpaced(lengthIn, spacingIn).map((atIn) => ({ id: newId(), atIn }));
});
