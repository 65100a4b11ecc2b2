import { checkArray, checkObject, checkPositive, checkNonNegative } from './check';

/** One point of a forced-air curve: Rθsa at an approach air speed. */
export type AirPoint = { airSpeedMPerS: number; rthKPerW: number };

/**
 * Where a requested speed fell: inside the points, or clamped to the slowest / fastest one.
 * Below the slowest point the clamped value is optimistic (the sink is worse there).
 */
export type CurveRange = 'inside' | 'below' | 'above';

/** Checks a forced-air curve: at least one point, speeds strictly increasing, all values > 0. */
export function checkAirPoints(value: unknown, path: string): AirPoint[] {
  const list = checkArray(value, path, 1);
  const points = list.map((item, i) => {
    const p = checkObject(item, `${path}[${i}]`);
    return {
      airSpeedMPerS: checkPositive(p.airSpeedMPerS, `${path}[${i}].airSpeedMPerS`),
      rthKPerW: checkPositive(p.rthKPerW, `${path}[${i}].rthKPerW`),
    };
  });
  for (let i = 1; i < points.length; i++) {
    if (!(points[i].airSpeedMPerS > points[i - 1].airSpeedMPerS)) {
      throw new RangeError(`${path}[${i}].airSpeedMPerS: must be above the previous point (points go in increasing air speed)`);
    }
  }
  return points;
}

/**
 * Rθsa at an air speed, interpolated linearly in log v – log R between neighbouring points
 * (a power law R ∝ v^(−b) between them, as laminar forced convection gives; PHYSICS.md §3).
 * Outside the points the end value is held and `range` says so.
 */
export function forcedAirRsa(points: readonly AirPoint[], airSpeedMPerS: number): { rthKPerW: number; range: CurveRange } {
  checkAirPoints(points, 'points');
  const v = checkNonNegative(airSpeedMPerS, 'airSpeedMPerS');
  const first = points[0];
  const last = points[points.length - 1];
  if (v < first.airSpeedMPerS) return { rthKPerW: first.rthKPerW, range: 'below' };
  if (v > last.airSpeedMPerS) return { rthKPerW: last.rthKPerW, range: 'above' };
  let i = 1;
  while (i < points.length - 1 && points[i].airSpeedMPerS < v) i++;
  if (points.length === 1) return { rthKPerW: first.rthKPerW, range: 'inside' };
  const a = points[i - 1];
  const b = points[i];
  const f = Math.log(v / a.airSpeedMPerS) / Math.log(b.airSpeedMPerS / a.airSpeedMPerS);
  return { rthKPerW: a.rthKPerW * Math.exp(f * Math.log(b.rthKPerW / a.rthKPerW)), range: 'inside' };
}
