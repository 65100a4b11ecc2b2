import { lowestLimit, checkCondition } from './allowed-current';
import { checkNumber } from './check';
import { checkSoaModel } from './check-model';
import { SOA_CHART_DECADES, SOA_CHART_FLOOR_RATIO, SOA_STRAIGHT_SLOPE_TOL } from './constants';
import { lineCrossing, pieceLines } from './log-piece';
import { soaPieces } from './soa-pieces';
import type { SoaBoundary, SoaBoundarySegment, SoaCondition, SoaModel } from './types';

export type BoundaryOptions = {
  /** Lowest Vce of the chart, V (default: SOA_CHART_DECADES decades below the top). */
  vceMinV?: number;
  /** Highest Vce of the chart, V (default: the voltage limit). */
  vceMaxV?: number;
};

/**
 * The SOA boundary at a condition for a log-log chart. Every limit is straight in log-log
 * between its own vertices, so the lower envelope only bends at those vertices and where two
 * limits cross: evaluating there gives the boundary exactly. Each segment is labelled with
 * the limit that applies; the voltage limit closes it with a vertical down to
 * SOA_CHART_FLOOR_RATIO of the current there.
 */
export function soaBoundary(model: SoaModel, cond: SoaCondition, options: BoundaryOptions = {}): SoaBoundary {
  checkSoaModel(model);
  checkCondition(cond);
  const { pieces, vceMaxV: limitV } = soaPieces(model, cond);
  const top = options.vceMaxV === undefined ? limitV : Math.min(checkNumber(options.vceMaxV, 'options.vceMaxV', 0, true), limitV);
  const bottom =
    options.vceMinV === undefined ? top / 10 ** SOA_CHART_DECADES : checkNumber(options.vceMinV, 'options.vceMinV', 0, true);
  if (!(bottom < top)) throw new RangeError(`options.vceMinV: must lie below the top of the chart (${top} V)`);
  const lo = Math.log(bottom);
  const hi = Math.log(top);
  const vs = [bottom, top];
  const lines = pieces.flatMap(pieceLines);
  for (const p of pieces) for (const x of p.x) if (x > lo && x < hi) vs.push(Math.exp(x));
  for (let a = 0; a < lines.length; a++) {
    for (let b = a + 1; b < lines.length; b++) {
      const x = lineCrossing(lines[a], lines[b]);
      if (x !== null && x > lo && x < hi) vs.push(Math.exp(x));
    }
  }
  vs.sort((a, b) => a - b);
  const at = (v: number) => lowestLimit(pieces, limitV, v);
  const segments: SoaBoundarySegment[] = [];
  for (let k = 0; k + 1 < vs.length; k++) {
    const [v0, v1] = [vs[k], vs[k + 1]];
    if (v1 - v0 <= 1e-12 * v1) continue;
    const { limit } = at(Math.sqrt(v0 * v1));
    const end = { vceV: v1, icA: at(v1).currentA };
    const current = segments[segments.length - 1];
    if (current && current.limit === limit) current.points.push(end);
    else segments.push({ limit, points: [{ vceV: v0, icA: at(v0).currentA }, end] });
  }
  for (const seg of segments) seg.points = dropStraightRuns(seg.points);
  if (top === limitV && segments.length > 0) {
    const last = segments[segments.length - 1].points;
    const ic = last[last.length - 1].icA;
    if (ic > 0) segments.push({ limit: 'voltage', points: [{ vceV: top, icA: ic }, { vceV: top, icA: ic * SOA_CHART_FLOOR_RATIO }] });
  }
  return { condition: cond, segments, vceMaxV: limitV };
}

/** Drops interior points where the line does not bend in log-log (crossings of limits that do not apply). */
function dropStraightRuns(points: SoaBoundarySegment['points']): SoaBoundarySegment['points'] {
  if (points.length < 3 || points.some((p) => !(p.icA > 0))) return points;
  const slope = (a: (typeof points)[number], b: (typeof points)[number]) => Math.log(b.icA / a.icA) / Math.log(b.vceV / a.vceV);
  const kept = [points[0]];
  for (let k = 1; k + 1 < points.length; k++) {
    const prev = kept[kept.length - 1];
    if (Math.abs(slope(prev, points[k]) - slope(points[k], points[k + 1])) > SOA_STRAIGHT_SLOPE_TOL) kept.push(points[k]);
  }
  kept.push(points[points.length - 1]);
  return kept;
}
