import type Konva from 'konva';
import type { KonvaEventObject } from 'konva/lib/Node';
import type { Vector2d } from 'konva/lib/types';

export interface PinnedDragCallbacks {
  onDragStart(): void;
  /** The pointer's travel since the drag started, in sketch pixels. */
  onDragMove(dx: number, dy: number): void;
  onDragEnd(): void;
}

/** Where each dragged node sat when its drag started, and how far the pointer has taken it since. */
const drags = new WeakMap<Konva.Node, { origin: Vector2d; travel: Vector2d }>();

/**
 * Konva drag props that keep the node where it is and report the pointer's travel instead. Konva
 * redraws a dragged node's layer on every move; pinned, the layer with the whole sketch stays still
 * while the drag-preview layer draws the moved items (see DragPreviewLayer).
 */
export function pinnedDrag({ onDragStart, onDragMove, onDragEnd }: PinnedDragCallbacks) {
  return {
    dragBoundFunc(this: Konva.Node, pos: Vector2d): Vector2d {
      const drag = drags.get(this);
      if (!drag) return pos;
      const scale = this.getStage()?.scaleX() || 1;
      drag.travel = { x: (pos.x - drag.origin.x) / scale, y: (pos.y - drag.origin.y) / scale };
      return drag.origin;
    },
    onDragStart(e: KonvaEventObject<DragEvent>) {
      e.cancelBubble = true;
      drags.set(e.target, { origin: e.target.absolutePosition(), travel: { x: 0, y: 0 } });
      onDragStart();
    },
    onDragMove(e: KonvaEventObject<DragEvent>) {
      const drag = drags.get(e.target);
      if (drag) onDragMove(drag.travel.x, drag.travel.y);
    },
    onDragEnd(e: KonvaEventObject<DragEvent>) {
      drags.delete(e.target);
      onDragEnd();
    },
  };
}
