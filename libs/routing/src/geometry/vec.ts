/** Plain 2-D vector maths. Unit-free: callers decide whether numbers are pixels or inches. */
export interface Vec {
  readonly x: number;
  readonly y: number;
}

export const vec = (x: number, y: number): Vec => ({ x, y });
export const add = (a: Vec, b: Vec): Vec => ({ x: a.x + b.x, y: a.y + b.y });
export const sub = (a: Vec, b: Vec): Vec => ({ x: a.x - b.x, y: a.y - b.y });
export const scale = (a: Vec, k: number): Vec => ({ x: a.x * k, y: a.y * k });
export const dot = (a: Vec, b: Vec): number => a.x * b.x + a.y * b.y;
export const cross = (a: Vec, b: Vec): number => a.x * b.y - a.y * b.x;
/**
 * √(dx² + dy²). Not Math.hypot: V8 does not inline it and boxes its arguments, which makes it the
 * largest source of garbage in a circuit evaluation; sketch and inch values cannot overflow here.
 */
export const norm = (dx: number, dy: number): number => Math.sqrt(dx * dx + dy * dy);
export const length = (a: Vec): number => norm(a.x, a.y);
export const distance = (a: Vec, b: Vec): number => norm(a.x - b.x, a.y - b.y);
export const lerp = (a: Vec, b: Vec, t: number): Vec => ({ x: a.x + (b.x - a.x) * t, y: a.y + (b.y - a.y) * t });

/** Unit vector of a; the zero vector stays zero. */
export function normalize(a: Vec): Vec {
  const len = length(a);
  return len === 0 ? { x: 0, y: 0 } : { x: a.x / len, y: a.y / len };
}

/** Rotates a by `degrees` (positive turns +x towards +y, i.e. clockwise on a y-down sketch). */
export function rotate(a: Vec, degrees: number): Vec {
  const r = (degrees * Math.PI) / 180;
  const c = Math.cos(r);
  const s = Math.sin(r);
  return { x: a.x * c - a.y * s, y: a.x * s + a.y * c };
}

/** Deflection between an incoming and an outgoing direction, 0 (straight on) … π (turn back). */
export function deflection(incoming: Vec, outgoing: Vec): number {
  return Math.atan2(Math.abs(cross(incoming, outgoing)), dot(incoming, outgoing));
}
