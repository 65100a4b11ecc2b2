import { sameVce } from './check-model';
import { SOA_SLOPE_CURRENT_MIN, SOA_SLOPE_THERMAL_MIN } from './constants';
import { deratingFactor, thermalDeratingFactor } from './derating';
import type { LogPiece } from './log-piece';
import type { PulseWidth, SoaCondition, SoaCurve, SoaLimit, SoaPoints } from './types';

const order = (p: PulseWidth): number => (p === 'dc' ? Infinity : p);

/**
 * The datasheet curve that covers a pulse: the shortest rated pulse at least as long
 * (conservative: a longer pulse's boundary lies lower), DC for 'dc'.
 */
export function curveFor(m: SoaPoints, pulseS: PulseWidth): SoaCurve {
  const want = order(pulseS);
  let best: SoaCurve | undefined;
  for (const c of m.curves) if (order(c.pulseS) >= want && (!best || order(c.pulseS) < order(best.pulseS))) best = c;
  if (!best) {
    throw new RangeError(
      pulseS === 'dc'
        ? 'model.curves: no DC curve (add one to check DC operation)'
        : `model.curves: no curve covers a pulse of ${pulseS} s (add a longer pulse or a DC curve)`,
    );
  }
  return best;
}

const classify = (slope: number): SoaLimit =>
  slope > SOA_SLOPE_CURRENT_MIN ? 'current' : slope >= SOA_SLOPE_THERMAL_MIN ? 'thermal' : 'second-breakdown';

/** Points up to the voltage limit (a closing vertical dropped) and that limit, V. */
export function curveBody(c: SoaCurve): { points: SoaCurve['points']; vceMaxV: number } {
  const n = c.points.length;
  const body = sameVce(c.points[n - 1].vceV, c.points[n - 2].vceV) ? c.points.slice(0, n - 1) : c.points;
  return { points: body, vceMaxV: body[body.length - 1].vceV };
}

/**
 * The limits of a datasheet boundary at case temperature Tc. Segments are sorted by log-log
 * slope into current limit (flat, not derated), thermal line (≈ −1, derated as Tj,max − Tc)
 * and second breakdown (steeper, its own derating). Each run of one kind becomes a piece
 * extended along its end slopes, and the boundary is their minimum: on a concave curve, the
 * usual SOA shape, that is the curve itself at 25 °C and the derated curve above it. The
 * first run is held flat below the first point, as the datasheet says nothing there.
 */
export function pointPieces(m: SoaPoints, cond: SoaCondition): { pieces: LogPiece[]; vceMaxV: number } {
  const { points, vceMaxV } = curveBody(curveFor(m, cond.pulseS));
  const x = points.map((p) => Math.log(p.vceV));
  const y = points.map((p) => Math.log(p.icA));
  const thermal = thermalDeratingFactor(m.tjMaxC, cond.caseC);
  const factor: Record<SoaLimit, number> = {
    current: 1,
    thermal,
    'second-breakdown': m.secondBreakdownDerating ? deratingFactor(m.secondBreakdownDerating, cond.caseC) : thermal,
    voltage: 1,
  };
  const pieces: LogPiece[] = [];
  let start = 0;
  for (let j = 0; j + 1 < points.length; j++) {
    const kind = classify((y[j + 1] - y[j]) / (x[j + 1] - x[j]));
    const last = j + 2 === points.length;
    const nextKind = last ? null : classify((y[j + 2] - y[j + 1]) / (x[j + 2] - x[j + 1]));
    if (nextKind === kind) continue;
    const shift = factor[kind] > 0 ? Math.log(factor[kind]) : -Infinity;
    const px = x.slice(start, j + 2);
    const raw = y.slice(start, j + 2);
    const n = px.length;
    pieces.push({
      limit: kind,
      x: px,
      y: raw.map((v) => v + shift),
      leftSlope: start === 0 ? 0 : (raw[1] - raw[0]) / (px[1] - px[0]),
      rightSlope: (raw[n - 1] - raw[n - 2]) / (px[n - 1] - px[n - 2]),
    });
    start = j + 1;
  }
  return { pieces, vceMaxV };
}
