import type { PortRef } from '@linesmith/routing';
import { command, newId } from './command';

/** Bend radius a drawn corner starts with; the inspector sets the real one (common practice: 3 in suits -6 to -8 hose). */
export const DEFAULT_BEND_RADIUS_IN = 3;

export interface AddLineArgs {
  from: PortRef;
  to: PortRef;
  /** Corner points clicked between the two ports, in sketch pixels. */
  corners: Array<{ x: number; y: number }>;
  id?: string;
}

const samePort = (a: PortRef, b: PortRef) => a.unitId === b.unitId && a.portId === b.portId;

/** Finishes a drawn line: port → corners → port, no hose or end stacks yet. */
export const addLine = command<AddLineArgs>('Draw line', (draft, { from, to, corners, id }) => {
  if (samePort(from, to)) throw new RangeError('A line needs two different ports');
  const taken = draft.lines.find((l) => [l.from, l.to].some((end) => samePort(end, from) || samePort(end, to)));
  if (taken) throw new RangeError(`A port of this line already takes line "${taken.id}"`);
  draft.lines.push({
    id: id ?? newId(),
    from: { ...from },
    to: { ...to },
    hosePartId: null,
    points: corners.map((c) => ({ x: c.x, y: c.y, bendRadiusIn: DEFAULT_BEND_RADIUS_IN })),
    measuredLengthIn: null,
    endStacks: { from: [], to: [] },
    supports: [],
    sleeves: [],
  });
});
