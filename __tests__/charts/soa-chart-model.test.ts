import { logFrame } from '@/charts/log-frame';
import { boundaryCurrentAt, boundaryStyle, mostOccurrences, nearestPoint, pointRadii, POINT_RADIUS_MAX, POINT_RADIUS_MIN, segmentLabels } from '@/charts/soa-chart-model';
import { overlaps } from '@/charts/label-layout';
import { soaBoundary, type SoaModel } from '@/core/soa';

import { assertInRelDelta } from '../helpers/assert-in-delta';

// Invented bipolar part: Ic,max 15 A, Vceo 140 V, Rθjc 0.83 K/W, Tj,max 150 °C, second breakdown.
const model: SoaModel = {
  kind: 'parameters',
  transistor: 'bipolar',
  tjMaxC: 150,
  icMaxA: 15,
  vceoV: 140,
  rthJcKPerW: 0.83,
  secondBreakdown: { referenceVceV: 50, referenceIcA: 2.4, exponent: 2.2, derating: { kind: 'linear', fractionPerK: 0.004 } },
};
const dc25 = { label: 'DC, 25 °C', segments: soaBoundary(model, { caseC: 25, pulseS: 'dc' }).segments };
const dc100 = { label: 'DC, 100 °C', segments: soaBoundary(model, { caseC: 100, pulseS: 'dc' }).segments };

describe('SOA chart model', () => {
  it('reads the thermal line between its points as Ic = Pmax / Vce', () => {
    // Pmax = (Tj,max − Tc) / Rθjc = 125 / 0.83 W, and Ic = Pmax / Vce on the thermal line (PHYSICS.md §4).
    const at = boundaryCurrentAt(dc25, 20);
    expect(at?.limit).toBe('thermal');
    assertInRelDelta(at!.icA, 125 / 0.83 / 20, 1e-9, 'Ic at 20 V');
    // At 100 °C case: (150 − 100) / 0.83 W.
    assertInRelDelta(boundaryCurrentAt(dc100, 20)!.icA, 50 / 0.83 / 20, 1e-9, 'Ic at 20 V, 100 °C');
    // Second breakdown at 25 °C: I0 (Vce / V0)^(−n) = 2.4 (100 / 50)^(−2.2) A (PHYSICS.md §4).
    assertInRelDelta(boundaryCurrentAt(dc25, 100)!.icA, 2.4 * 2 ** -2.2, 1e-9, 'Is/b at 100 V');
    expect(boundaryCurrentAt(dc25, 141)).toBeNull();
    expect(boundaryCurrentAt(dc25, 5)).toEqual({ icA: 15, limit: 'current' });
  });

  it('places limit names inside the plot without covering each other, each limit named once', () => {
    for (const width of [326, 900]) {
      const xs = [...dc25.segments, ...dc100.segments].flatMap((s) => s.points.map((p) => p.vceV));
      const ys = [...dc25.segments, ...dc100.segments].flatMap((s) => s.points.map((p) => p.icA));
      const frame = logFrame(width, 300, xs, ys)!;
      const labels = segmentLabels(frame, [dc25, dc100]);
      for (let i = 0; i < labels.length; i++) {
        expect(labels[i].box.x).toBeGreaterThanOrEqual(frame.left);
        expect(labels[i].box.x + labels[i].box.width).toBeLessThanOrEqual(frame.right);
        for (let j = i + 1; j < labels.length; j++) expect(overlaps(labels[i].box, labels[j].box)).toBe(false);
      }
      if (width === 900) expect(labels.filter((l) => l.key.startsWith('0-')).map((l) => l.text)).toEqual(['current', 'thermal', 'second breakdown', 'voltage']);
      // The derated boundary has the same four limits, already named by the first.
      expect(labels.filter((l) => l.key.startsWith('1-'))).toEqual([]);
    }
  });

  it('finds the operating point under a tap, and none when the tap is far from every point', () => {
    const frame = logFrame(400, 300, [1, 100], [0.1, 20])!;
    const points = [{ vceV: 10, icA: 2 }, { vceV: 40, icA: 0.5 }];
    expect(nearestPoint(frame, points, frame.x(40) + 3, frame.y(0.5) - 2)).toBe(1);
    expect(nearestPoint(frame, points, frame.x(2), frame.y(10))).toBeNull();
  });

  it('gives the first boundaries distinct dash patterns as well as colours', () => {
    const styles = [0, 1, 2, 3, 4, 5].map(boundaryStyle);
    expect(new Set(styles.map((s) => s.dash ?? 'solid')).size).toBe(6);
    expect(new Set(styles.map((s) => s.stroke)).size).toBe(6);
  });
});

describe('SOA chart point sizes', () => {
  const at = (occurrences?: number) => ({ vceV: 10, icA: 1, occurrences });

  it('gives more stretches a larger ring, its area growing with the logarithm of the count', () => {
    const r = pointRadii([at(1), at(10), at(100), at(1000)]);
    expect(r[0]).toBeLessThan(r[1]);
    expect(r[1]).toBeLessThan(r[2]);
    expect(r[2]).toBeLessThan(r[3]);
    // Area ∝ log n above the smallest ring: each tenfold step adds the same area (log10 1000 = 3 steps).
    const area = r.map((x) => Math.PI * x * x);
    const step = (area[3] - area[0]) / 3;
    assertInRelDelta(area[1] - area[0], step, 1e-9, 'area added by 1 → 10');
    assertInRelDelta(area[2] - area[1], step, 1e-9, 'area added by 10 → 100');
  });

  it('keeps every ring between the smallest and largest readable radius, whatever the counts', () => {
    const r = pointRadii([at(1), at(2), at(1e9), at(undefined), at(0), at(Number.NaN)]);
    for (const x of r) {
      expect(x).toBeGreaterThanOrEqual(POINT_RADIUS_MIN);
      expect(x).toBeLessThanOrEqual(POINT_RADIUS_MAX);
    }
    expect(r[0]).toBe(POINT_RADIUS_MIN);
    expect(r[2]).toBeCloseTo(POINT_RADIUS_MAX, 12);
    // A missing or meaningless count counts as one stretch.
    expect(r.slice(3)).toEqual([POINT_RADIUS_MIN, POINT_RADIUS_MIN, POINT_RADIUS_MIN]);
    // On a 390 px phone the plot is about 320 px wide: the largest ring stays under 6 % of it.
    expect(2 * POINT_RADIUS_MAX).toBeLessThan(0.06 * 320);
    expect(mostOccurrences([at(3), at(1e9), at(undefined)])).toBe(1e9);
  });

  it('draws every point at the smallest ring when none stands for more than one stretch', () => {
    expect(pointRadii([at(1), at(undefined), at(1)])).toEqual([POINT_RADIUS_MIN, POINT_RADIUS_MIN, POINT_RADIUS_MIN]);
    expect(mostOccurrences([at(1), at(undefined)])).toBe(1);
  });
});
