import type { CircuitLine, CircuitUnit, LineReport } from '@linesmith/routing';
import type { KonvaEventObject } from 'konva/lib/Node';
import { Fragment, memo } from 'react';
import { Group, Line } from 'react-konva';
import { linePathIn, pathPoints, positionAlong, routePx, type LinePathIn } from '../../model/geometry/line-route';
import type { Point } from '../../model/tools';
import type { FluidStyle } from '../../utils/fluid-colours';
import { DimensionLabel } from './DimensionLabel';
import { SleeveBand } from './SleeveBand';
import { SupportMark } from './SupportMark';

export interface LineShapeProps {
  line: CircuitLine;
  /** The units at the line's ends (one unit when both ends are on it); a moved unit redraws only its lines. */
  from: CircuitUnit | undefined;
  to: CircuitUnit | undefined;
  report: LineReport | undefined;
  pxPerIn: number | null;
  fluid: FluidStyle;
  selected: boolean;
  /** Left out of the drawing while a drag preview draws it elsewhere. */
  hidden?: boolean;
  zoom: number;
  /** Draws the cut-length label with the line; the editor leaves it out and draws labels above the units. */
  label?: string;
  onSelect(lineId: string, event: KonvaEventObject<MouseEvent>): void;
  onDoubleClick(lineId: string, point: Point): void;
}

/** Sketch points along [startIn, endIn] of the line, for sleeves. */
function stretchPoints(geometry: LinePathIn, startIn: number, endIn: number, pxPerIn: number): number[] {
  const steps = Math.max(2, Math.ceil((endIn - startIn) / 0.5));
  const flat: number[] = [];
  for (let i = 0; i <= steps; i++) {
    const p = positionAlong(geometry, startIn + ((endIn - startIn) * i) / steps, pxPerIn);
    flat.push(p.x, p.y);
  }
  return flat;
}

/** Where a line's cut-length label sits: the middle of its middle leg. */
export function labelPosition(route: readonly Point[]): Point {
  const mid = Math.floor((route.length - 1) / 2);
  const a = route[mid];
  const b = route[mid + 1] ?? a;
  return { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
}

/** A line: its route with bends in the fluid-class colour, sleeves and supports (its label is drawn on top, see DimensionLabel). */
export const LineShape = memo(function LineShape(props: LineShapeProps) {
  const { line, from, to, report, pxPerIn, fluid, selected, hidden = false, zoom, label, onSelect, onDoubleClick } = props;
  const doc = { units: [from, to].filter((u): u is CircuitUnit => u !== undefined) };
  const route = routePx(doc, line);
  if (!route) return null;
  const basisIn = report?.measuredLengthIn ?? null;
  const geometry = pxPerIn ? linePathIn(doc, line, pxPerIn, basisIn) : null;
  const points = geometry && pxPerIn && report?.fits !== false ? pathPoints(geometry, pxPerIn) : route.flatMap((p) => [p.x, p.y]);
  return (
    <Group name="line" visible={!hidden}>
      {geometry &&
        pxPerIn &&
        report?.sleeves.uncoveredIn.map((s, i) => (
          <SleeveBand key={`need-${i}`} points={stretchPoints(geometry, s.start, s.end, pxPerIn)} zoom={zoom} planned />
        ))}
      {geometry &&
        pxPerIn &&
        line.sleeves.map((s) => <SleeveBand key={s.id} points={stretchPoints(geometry, s.startIn, s.endIn, pxPerIn)} zoom={zoom} />)}
      {selected && <Line points={points} stroke="#2563eb" strokeWidth={9 / zoom} opacity={0.35} listening={false} lineJoin="round" />}
      <Line
        points={points}
        stroke={fluid.stroke}
        strokeWidth={4 / zoom}
        hitStrokeWidth={14 / zoom}
        lineJoin="round"
        lineCap="round"
        dash={line.hosePartId ? undefined : [10 / zoom, 6 / zoom]}
        onClick={(e) => onSelect(line.id, e)}
       
        onDblClick={(e) => {
          e.cancelBubble = true;
          const stage = e.target.getStage();
          const pointer = stage?.getRelativePointerPosition();
          if (pointer) onDoubleClick(line.id, pointer);
        }}
      />
      {geometry &&
        pxPerIn &&
        line.supports.map((s) => {
          const p = positionAlong(geometry, s.atIn, pxPerIn);
          return (
            <Fragment key={s.id}>
              <SupportMark x={p.x} y={p.y} zoom={zoom} />
            </Fragment>
          );
        })}
      {label && <DimensionLabel x={labelPosition(route).x + 6 / zoom} y={labelPosition(route).y + 6 / zoom} text={label} style={fluid} zoom={zoom} />}
    </Group>
  );
});
