import type { SoaLimit } from './types';

/**
 * One limit of the boundary as a polyline in (ln Vce, ln Ic), x ascending, extended with
 * leftSlope / rightSlope beyond its ends. y = −Infinity everywhere means "nothing allowed".
 */
export type LogPiece = { limit: SoaLimit; x: number[]; y: number[]; leftSlope: number; rightSlope: number };

/** A straight part of a piece: y = y0 + slope (x − x0) for x in [from, to]. */
export type LogLine = { x0: number; y0: number; slope: number; from: number; to: number };

/** ln Ic of the piece at ln Vce = lx (lx may be −Infinity, for Vce = 0). */
export function pieceLogCurrent(p: LogPiece, lx: number): number {
  const { x, y } = p;
  const n = x.length;
  if (y[0] === -Infinity) return -Infinity;
  if (lx <= x[0]) return p.leftSlope === 0 ? y[0] : y[0] + p.leftSlope * (lx - x[0]);
  if (lx >= x[n - 1]) return p.rightSlope === 0 ? y[n - 1] : y[n - 1] + p.rightSlope * (lx - x[n - 1]);
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= lx) lo = mid;
    else hi = mid;
  }
  return y[lo] + ((lx - x[lo]) / (x[hi] - x[lo])) * (y[hi] - y[lo]);
}

/** The straight parts of a piece, extensions included. */
export function pieceLines(p: LogPiece): LogLine[] {
  const { x, y } = p;
  const n = x.length;
  const lines: LogLine[] = [{ x0: x[0], y0: y[0], slope: p.leftSlope, from: -Infinity, to: x[0] }];
  for (let j = 0; j + 1 < n; j++) {
    lines.push({ x0: x[j], y0: y[j], slope: (y[j + 1] - y[j]) / (x[j + 1] - x[j]), from: x[j], to: x[j + 1] });
  }
  lines.push({ x0: x[n - 1], y0: y[n - 1], slope: p.rightSlope, from: x[n - 1], to: Infinity });
  return lines;
}

/** ln Vce where two straight parts cross inside both of their ranges, or null. */
export function lineCrossing(a: LogLine, b: LogLine): number | null {
  if (a.slope === b.slope || !Number.isFinite(a.y0) || !Number.isFinite(b.y0)) return null;
  const x = (b.y0 - a.y0 + a.slope * a.x0 - b.slope * b.x0) / (a.slope - b.slope);
  if (!Number.isFinite(x) || x < a.from || x > a.to || x < b.from || x > b.to) return null;
  return x;
}
