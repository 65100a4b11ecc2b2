import { scaleLinear } from 'd3-scale';

export type FinScanRow = { finCount: number; rsaKPerW: number };

/** Above this multiple of the lowest Rθsa the curve is cut off, so the minimum stays readable. */
export const FIN_SCAN_Y_SPAN = 3;

/**
 * The Rθsa axis of a fin-count scan: from a nice value at or below the lowest Rθsa to one at or
 * above the highest, capped at FIN_SCAN_Y_SPAN times the lowest (crowded fins choke the channels
 * and would flatten the rest of the curve).
 */
export function finScanDomain(rows: readonly FinScanRow[]): [number, number] {
  const values = rows.map((r) => r.rsaKPerW).filter((v) => Number.isFinite(v) && v > 0);
  if (values.length === 0) return [0, 1];
  const lo = Math.min(...values);
  const hi = Math.min(Math.max(...values), lo * FIN_SCAN_Y_SPAN);
  const [a, b] = scaleLinear()
    .domain([lo, hi > lo ? hi : lo * 1.1])
    .nice(4)
    .domain();
  return [a, b];
}

/** The rows inside the Rθsa axis, in fin-count order (points beyond the cap are left out, not clamped). */
export function finScanVisible(rows: readonly FinScanRow[], domain: readonly [number, number]): FinScanRow[] {
  return rows.filter((r) => r.rsaKPerW >= domain[0] && r.rsaKPerW <= domain[1]).sort((a, b) => a.finCount - b.finCount);
}
