import type { KonvaEventObject } from 'konva/lib/Node';
import { Rect } from 'react-konva';

export interface CornerHandleProps {
  x: number;
  y: number;
  zoom: number;
  selected: boolean;
  onPointerDown(event: KonvaEventObject<MouseEvent>): void;
  onDragStart(): void;
  onDragMove(x: number, y: number): void;
  onDragEnd(): void;
}

/** A draggable square on a route corner; Alt+click removes the corner (handled by the caller). */
export function CornerHandle({ x, y, zoom, selected, onPointerDown, onDragStart, onDragMove, onDragEnd }: CornerHandleProps) {
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
      draggable
      onMouseDown={onPointerDown}
      onDragStart={(e) => {
        e.cancelBubble = true;
        onDragStart();
      }}
      onDragMove={(e) => onDragMove(e.target.x() , e.target.y())}
      onDragEnd={onDragEnd}
      name="corner"
    />
  );
}
