import type { SketchBackground } from '@linesmith/routing';
import { command } from './command';

/** Sets the photo behind the sketch (null removes it), its opacity and whether it is locked. */
export const setBackground = command<{ background: SketchBackground | null }>('Set background', (draft, { background }) => {
  if (background && !(background.opacity >= 0 && background.opacity <= 1)) {
    throw new RangeError('Opacity runs from 0 to 1');
  }
  draft.background = background ? { ...background } : null;
});
