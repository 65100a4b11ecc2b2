/** A point of a datasheet curve: x and y in the units of the curve that holds it. */
export type CurvePoint = { x: number; y: number };

/**
 * Piecewise-linear y(x) through points (x strictly increasing), held flat beyond the first
 * and last point: a datasheet curve says nothing outside its range, and a slope carried
 * past the last point could turn negative.
 */
export function interpolateLinear(points: readonly CurvePoint[], x: number): number {
  if (points.length === 0) throw new RangeError('points: a curve needs at least one point');
  if (x <= points[0].x) return points[0].y;
  const last = points[points.length - 1];
  if (x >= last.x) return last.y;
  let lo = 0;
  let hi = points.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (points[mid].x <= x) lo = mid;
    else hi = mid;
  }
  const a = points[lo];
  const b = points[hi];
  return a.y + ((x - a.x) / (b.x - a.x)) * (b.y - a.y);
}
