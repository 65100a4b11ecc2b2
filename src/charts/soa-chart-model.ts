import type { SoaLimit } from '@/core/soa';
import { chartColor } from '@/constants/theme';

import type { LineStyle } from './heat-curves-model';
import { labelWidth, placeLabels, type Box } from './label-layout';
import type { LogFrame } from './log-frame';

export type SoaChartPointValue = { vceV: number; icA: number };
export type SoaChartSegment = { limit: SoaLimit; points: readonly SoaChartPointValue[] };
/** One boundary of the chart (a case temperature and pulse width), its segments labelled by limit. */
export type SoaChartBoundary = { label: string; segments: readonly SoaChartSegment[] };
/**
 * An operating point; `worst` marks the one with the smallest margin, `occurrences` counts the
 * stretches of the profile merged into it (1 when absent).
 */
export type SoaChartPoint = SoaChartPointValue & { worst?: boolean; occurrences?: number };

export const LIMIT_LABEL: Record<SoaLimit, string> = {
  current: 'current',
  thermal: 'thermal',
  'second-breakdown': 'second breakdown',
  voltage: 'voltage',
};

const DASHES = [undefined, '6 3', '1.5 3', '8 3 2 3', '10 4', '3 2'];

/** Colour and dash of the i-th boundary: no two tell apart by colour alone. */
export function boundaryStyle(index: number): LineStyle {
  return {
    stroke: chartColor.devices[index % chartColor.devices.length],
    width: index === 0 ? 2.25 : 1.75,
    dash: DASHES[index % DASHES.length],
  };
}

/**
 * The boundary's allowed current at a Vce, straight on log-log axes between its points (as the
 * SOA core draws it), with the limit that sets it; null outside its Vce range.
 */
export function boundaryCurrentAt(boundary: SoaChartBoundary, vceV: number): { icA: number; limit: SoaLimit } | null {
  for (const seg of boundary.segments) {
    for (let k = 0; k + 1 < seg.points.length; k++) {
      const a = seg.points[k];
      const b = seg.points[k + 1];
      if (a.vceV === b.vceV) continue;
      if (vceV < Math.min(a.vceV, b.vceV) || vceV > Math.max(a.vceV, b.vceV)) continue;
      if (!(a.icA > 0 && b.icA > 0)) return { icA: Math.min(a.icA, b.icA), limit: seg.limit };
      const f = Math.log(vceV / a.vceV) / Math.log(b.vceV / a.vceV);
      return { icA: a.icA * (b.icA / a.icA) ** f, limit: seg.limit };
    }
  }
  return null;
}

export type SegmentLabel = { key: string; text: string; color: string; box: Box };

export const SOA_LABEL_SIZE = 11;

/**
 * Where each segment's limit name goes: beside the longest straight piece of the segment
 * (above a flat one, left of the vertical, above-right of a sloping one, then the other side),
 * clear of other labels and markers; a label with no free place is left out. Every segment of
 * the first boundary is named; a later boundary names only the limits not named before it, so
 * four boundaries do not stack four "voltage" labels.
 */
export function segmentLabels(frame: LogFrame, boundaries: readonly SoaChartBoundary[], taken: readonly Box[] = []): SegmentLabel[] {
  const texts: { key: string; text: string; color: string }[] = [];
  const candidates: Box[][] = [];
  const h = SOA_LABEL_SIZE + 1;
  const named = new Set<SoaLimit>();
  boundaries.forEach((b, bi) => {
    const before = new Set(named);
    b.segments.forEach((seg, si) => {
      if (bi > 0 && before.has(seg.limit)) return;
      named.add(seg.limit);
      let best: { x0: number; y0: number; x1: number; y1: number; length: number } | null = null;
      for (let k = 0; k + 1 < seg.points.length; k++) {
        const p = seg.points[k];
        const q = seg.points[k + 1];
        if (!(p.icA > 0 && q.icA > 0)) continue;
        const piece = { x0: frame.x(p.vceV), y0: frame.y(p.icA), x1: frame.x(q.vceV), y1: frame.y(q.icA), length: 0 };
        piece.length = Math.hypot(piece.x1 - piece.x0, piece.y1 - piece.y0);
        if (!best || piece.length > best.length) best = piece;
      }
      if (!best || best.length < 12) return;
      const text = LIMIT_LABEL[seg.limit];
      const w = labelWidth(text, SOA_LABEL_SIZE);
      const mx = (best.x0 + best.x1) / 2;
      const my = (best.y0 + best.y1) / 2;
      const flat = Math.abs(best.y1 - best.y0) < 0.25 * Math.abs(best.x1 - best.x0);
      const upright = Math.abs(best.x1 - best.x0) < 0.25 * Math.abs(best.y1 - best.y0);
      let options: Box[];
      if (flat) options = [{ x: mx - w / 2, y: my - h - 4, width: w, height: h }, { x: mx - w / 2, y: my + 4, width: w, height: h }];
      else if (upright) options = [{ x: mx - w - 6, y: my - h / 2, width: w, height: h }, { x: mx + 6, y: my - h / 2, width: w, height: h }];
      else options = [{ x: mx + 4, y: my - h - 2, width: w, height: h }, { x: mx - w - 4, y: my + 2, width: w, height: h }];
      texts.push({ key: `${bi}-${si}`, text, color: boundaryStyle(bi).stroke });
      candidates.push(options);
    });
  });
  const bounds: Box = { x: frame.left, y: frame.top - h, width: frame.right - frame.left, height: frame.bottom - frame.top + h };
  const placed = placeLabels(candidates, taken, bounds);
  return texts.flatMap((t, i) => (placed[i] ? [{ ...t, box: placed[i]! }] : []));
}

/** The index of the operating point nearest to (x, y) px, within maxPx; null if none is that close. */
export function nearestPoint(frame: LogFrame, points: readonly SoaChartPointValue[], x: number, y: number, maxPx = 14): number | null {
  let best: number | null = null;
  let bestD = maxPx;
  points.forEach((p, i) => {
    if (!(p.vceV > 0 && p.icA > 0)) return;
    const d = Math.hypot(frame.x(p.vceV) - x, frame.y(p.icA) - y);
    if (d <= bestD) {
      bestD = d;
      best = i;
    }
  });
  return best;
}

const countOf = (p: SoaChartPoint) => (p.occurrences !== undefined && Number.isFinite(p.occurrences) && p.occurrences > 1 ? p.occurrences : 1);

/** The most stretches any one point stands for (1 when none stands for more). */
export const mostOccurrences = (points: readonly SoaChartPoint[]) => points.reduce((m, p) => Math.max(m, countOf(p)), 1);

/** Ring radii of the operating points, px: the smallest is today's plain ring, the largest stays readable beside it on a phone. */
export const POINT_RADIUS_MIN = 3.5;
export const POINT_RADIUS_MAX = 9;

/**
 * The ring radius of each operating point, px, from the stretches it stands for: the ring's
 * area grows with the logarithm of its count, from POINT_RADIUS_MIN for a single stretch to
 * POINT_RADIUS_MAX for the point with the most (a log scale, so a point met a thousand times
 * does not bury the rest). All points get the smallest ring when none stands for more than one.
 */
export function pointRadii(points: readonly SoaChartPoint[]): number[] {
  const most = mostOccurrences(points);
  const min2 = POINT_RADIUS_MIN ** 2;
  const span2 = POINT_RADIUS_MAX ** 2 - min2;
  return points.map((p) => (most > 1 ? Math.sqrt(min2 + (span2 * Math.log(countOf(p))) / Math.log(most)) : POINT_RADIUS_MIN));
}

