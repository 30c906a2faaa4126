import type { HeatZone } from '@linesmith/routing';
import type { Context } from 'konva/lib/Context';
import type { KonvaEventObject } from 'konva/lib/Node';
import { memo } from 'react';
import { Group, Line, Text } from 'react-konva';
import { pinnedDrag } from './pinned-drag';

export interface HeatZoneShapeProps {
  zone: HeatZone;
  selected: boolean;
  draggable: boolean;
  /** Left out of the drawing while a drag preview draws it elsewhere. */
  hidden?: boolean;
  zoom: number;
  /** Clearance drawn around the zone, in sketch pixels (null without calibration). */
  clearancePx: number | null;
  onSelect(zoneId: string, event: KonvaEventObject<MouseEvent>): void;
  onDragStart(zoneId: string): void;
  /** The pointer's travel since the drag started, in sketch pixels (the zone itself stays put). */
  onDragMove(dx: number, dy: number): void;
  onDragEnd(): void;
}

const HATCH_GAP = 10;

/** A heat zone: red outline, red hatching clipped to the polygon, its label, and its clearance. */
export const HeatZoneShape = memo(function HeatZoneShape(props: HeatZoneShapeProps) {
  const { zone, selected, draggable, hidden = false, zoom, clearancePx, onSelect, onDragStart, onDragMove, onDragEnd } = props;
  const flat = zone.polygon.flatMap((p) => [p.x, p.y]);
  const xs = zone.polygon.map((p) => p.x);
  const ys = zone.polygon.map((p) => p.y);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const hatch: number[][] = [];
  for (let c = minX - (maxY - minY); c < maxX; c += HATCH_GAP) hatch.push([c, maxY, c + (maxY - minY), minY]);
  const clip = (ctx: Context) => {
    ctx.beginPath();
    zone.polygon.forEach((p, i) => (i === 0 ? ctx.moveTo(p.x, p.y) : ctx.lineTo(p.x, p.y)));
    ctx.closePath();
  };
  return (
    <Group
      visible={!hidden}
      draggable={draggable}
      {...pinnedDrag({ onDragStart: () => onDragStart(zone.id), onDragMove, onDragEnd })}
      name="zone"
    >
      {clearancePx !== null && clearancePx > 0 && (
        <Line points={flat} closed stroke="#fca5a5" strokeWidth={2 * clearancePx} lineJoin="round" opacity={0.25} listening={false} />
      )}
      <Group clipFunc={clip} listening={false}>
        {hatch.map((h, i) => (
          <Line key={i} points={h} stroke="#dc2626" strokeWidth={1.5 / zoom} opacity={0.6} />
        ))}
      </Group>
      <Line
        points={flat}
        closed
        fill="rgba(220, 38, 38, 0.12)"
        stroke={selected ? '#2563eb' : '#dc2626'}
        strokeWidth={(selected ? 3 : 2) / zoom}
        onClick={(e) => onSelect(zone.id, e)}
       
      />
      <Text
        text={`🔥 ${zone.label || zone.kind}`}
        x={minX}
        y={minY - 16 / zoom}
        fontSize={12 / zoom}
        fill="#991b1b"
        fontStyle="bold"
        listening={false}
      />
    </Group>
  );
});
