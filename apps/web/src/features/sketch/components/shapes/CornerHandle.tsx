import type { KonvaEventObject } from 'konva/lib/Node';
import { Rect } from 'react-konva';
import { pinnedDrag } from './pinned-drag';

export interface CornerHandleProps {
  x: number;
  y: number;
  zoom: number;
  selected: boolean;
  /** Left out of the drawing while a drag preview draws it elsewhere. */
  hidden?: boolean;
  /** False for the copy a drag preview draws. */
  draggable?: boolean;
  onPointerDown(event: KonvaEventObject<MouseEvent>): void;
  onDragStart(): void;
  /** The pointer's travel since the drag started, in sketch pixels (the handle itself stays put). */
  onDragMove(dx: number, dy: number): void;
  onDragEnd(): void;
}

/** A draggable square on a route corner; Alt+click removes the corner (handled by the caller). */
export function CornerHandle({ x, y, zoom, selected, hidden = false, draggable = true, onPointerDown, ...drag }: CornerHandleProps) {
  const size = 9 / zoom;
  return (
    <Rect
      x={x}
      y={y}
      offsetX={size / 2}
      offsetY={size / 2}
      width={size}
      height={size}
      fill={selected ? '#2563eb' : '#ffffff'}
      stroke="#1f2937"
      strokeWidth={1.5 / zoom}
      visible={!hidden}
      draggable={draggable}
      onMouseDown={onPointerDown}
      {...pinnedDrag(drag)}
      name="corner"
    />
  );
}
