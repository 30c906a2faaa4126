import type { Point } from './tools';

/** Stage transform: screen = sketch × zoom + offset. */
export interface View {
  zoom: number;
  x: number;
  y: number;
}

export const MIN_ZOOM = 0.1;
export const MAX_ZOOM = 8;
export const initialView: View = { zoom: 1, x: 0, y: 0 };

const clampZoom = (z: number) => Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, z));

/** Zooms by `factor` keeping the sketch point under `anchor` (screen pixels) still. */
export function zoomAt(view: View, factor: number, anchor: Point): View {
  const zoom = clampZoom(view.zoom * factor);
  const sketch = toSketch(view, anchor);
  return { zoom, x: anchor.x - sketch.x * zoom, y: anchor.y - sketch.y * zoom };
}

export const toSketch = (view: View, screen: Point): Point => ({ x: (screen.x - view.x) / view.zoom, y: (screen.y - view.y) / view.zoom });

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

/** The view that shows `bounds` inside a viewport of `width` × `height` with a margin. */
export function fitView(bounds: Bounds | null, width: number, height: number, margin = 40): View {
  if (!bounds || width <= 0 || height <= 0) return initialView;
  const w = Math.max(1, bounds.maxX - bounds.minX);
  const h = Math.max(1, bounds.maxY - bounds.minY);
  const zoom = clampZoom(Math.min((width - 2 * margin) / w, (height - 2 * margin) / h));
  return {
    zoom,
    x: width / 2 - ((bounds.minX + bounds.maxX) / 2) * zoom,
    y: height / 2 - ((bounds.minY + bounds.maxY) / 2) * zoom,
  };
}
