// Order statistics over samples, shared by every bench suite and the soak.

/** The p-th percentile (0–100) by the nearest-rank method; NaN for no samples. */
export function percentile(values, p) {
  if (values.length === 0) return NaN;
  const sorted = Float64Array.from(values).sort();
  const rank = Math.ceil((p / 100) * sorted.length);
  return sorted[Math.min(sorted.length, Math.max(1, rank)) - 1];
}

export const median = (values) => percentile(values, 50);

/** A bench row of the runner's table: `{ name, median, unit, goal?, ok? }`. */
export function row(name, value, unit, goal) {
  return goal === undefined ? { name, median: value, unit } : { name, median: value, unit, goal, ok: Number.isFinite(value) && value <= goal };
}
