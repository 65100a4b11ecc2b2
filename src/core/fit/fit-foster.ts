import { Matrix } from 'ml-matrix';
import { nnls } from './nnls';

export type ZthPoint = { timeS: number; zthKPerW: number };
export type FosterTermFit = { rKPerW: number; tauS: number };

export type FosterFit = {
  terms: FosterTermFit[];
  /** Root-mean-square of the relative error over the points. */
  rmsRelativeError: number;
  /** Largest relative error over the points, and where. */
  maxRelativeError: number;
  maxErrorTimeS: number;
  /**
   * Set when the points stop before the curve has levelled off: the total Rθjc (and the slow
   * terms) are then extrapolated, not measured.
   */
  warning?: string;
  /** The time-constant grid the fit chose from. */
  grid: { tauMinS: number; tauMaxS: number; perDecade: number };
};

export type FosterFitOptions = { perDecade?: number; pruneBelowFraction?: number };

/** Relative slope d ln Zth / d ln t below which the curve counts as levelled off. */
const LEVELLED_SLOPE = 0.05;

const fosterZthAt = (terms: FosterTermFit[], t: number) => terms.reduce((z, { rKPerW, tauS }) => z + rKPerW * -Math.expm1(-t / tauS), 0);

/**
 * Fits a Foster set to datasheet Zth(t) points: time constants fixed on a log grid (a few per
 * decade, reaching a decade beyond the points at both ends) and resistances by non-negative
 * least squares on the relative error (Lawson & Hanson 1974; the approach of PHYSICS.md §3),
 * then terms carrying less than `pruneBelowFraction` of the total are dropped and the rest
 * refitted.
 */
export function fitFoster(points: ZthPoint[], options: FosterFitOptions = {}): FosterFit {
  const perDecade = options.perDecade ?? 4;
  const prune = options.pruneBelowFraction ?? 1e-3;
  if (!(Number.isInteger(perDecade) && perDecade >= 1 && perDecade <= 8)) throw new RangeError(`perDecade: must be a whole number from 1 to 8, got ${perDecade}`);
  if (points.length < 2) throw new RangeError(`points: at least 2 Zth points are needed, got ${points.length}`);
  points.forEach((p, i) => {
    if (!(Number.isFinite(p.timeS) && p.timeS > 0)) throw new RangeError(`points[${i}].timeS: must be a positive number, got ${p.timeS}`);
    if (!(Number.isFinite(p.zthKPerW) && p.zthKPerW > 0)) throw new RangeError(`points[${i}].zthKPerW: must be a positive number, got ${p.zthKPerW}`);
  });
  const sorted = [...points].sort((a, b) => a.timeS - b.timeS);
  const tauMinS = sorted[0].timeS / 10;
  const tauMaxS = sorted[sorted.length - 1].timeS * 10;
  const decades = Math.log10(tauMaxS / tauMinS);
  const count = Math.max(2, Math.round(decades * perDecade) + 1);
  const grid = Array.from({ length: count }, (_, j) => tauMinS * 10 ** ((decades * j) / (count - 1)));

  const solveFor = (taus: number[]) => {
    const a = new Matrix(sorted.length, taus.length);
    sorted.forEach((p, i) => taus.forEach((tau, j) => a.set(i, j, -Math.expm1(-p.timeS / tau) / p.zthKPerW)));
    const { x } = nnls(a, sorted.map(() => 1));
    return taus.map((tauS, j) => ({ rKPerW: x[j], tauS })).filter((t) => t.rKPerW > 0);
  };

  let terms = solveFor(grid);
  const total = terms.reduce((s, t) => s + t.rKPerW, 0);
  const kept = terms.filter((t) => t.rKPerW >= prune * total);
  if (kept.length < terms.length && kept.length > 0) terms = solveFor(kept.map((t) => t.tauS));

  let sq = 0;
  let maxRelativeError = 0;
  let maxErrorTimeS = sorted[0].timeS;
  for (const p of sorted) {
    const e = Math.abs(fosterZthAt(terms, p.timeS) - p.zthKPerW) / p.zthKPerW;
    sq += e * e;
    if (e > maxRelativeError) {
      maxRelativeError = e;
      maxErrorTimeS = p.timeS;
    }
  }
  // Slope d Zth / d ln t at the last point, relative to Zth there: near 0 once it has levelled off.
  const last = sorted[sorted.length - 1];
  const slope = terms.reduce((d, { rKPerW, tauS }) => d + rKPerW * (last.timeS / tauS) * Math.exp(-last.timeS / tauS), 0) / fosterZthAt(terms, last.timeS);
  const warning =
    slope > LEVELLED_SLOPE
      ? `Zth is still rising at the last point (${last.timeS} s): the total Rθjc of ${terms.reduce((s, t) => s + t.rKPerW, 0).toPrecision(3)} K/W is extrapolated; add points at longer times or check it against the datasheet's Rθjc`
      : undefined;
  return { terms, ...(warning ? { warning } : {}), rmsRelativeError: Math.sqrt(sq / sorted.length), maxRelativeError, maxErrorTimeS, grid: { tauMinS, tauMaxS, perDecade } };
}
