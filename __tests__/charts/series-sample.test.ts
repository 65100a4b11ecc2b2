import { extentIn, indexAtOrBefore, valueAt, visibleRange } from '@/charts/series-sample';
import { evaluateStudy, parseStudy } from '@/core/study';

import { assertInDelta } from '../helpers/assert-in-delta';

const SERIES = { timeS: [0, 10, 20], valueC: [20, 40, 30] };

describe('series sampling', () => {
  it('interpolates on a straight line between points and is exact at them', () => {
    // Two-point linear interpolation: v = v0 + (v1 − v0)(t − t0)/(t1 − t0).
    expect(valueAt(SERIES, 5)).toBe(30);
    expect(valueAt(SERIES, 15)).toBe(35);
    expect(valueAt(SERIES, 10)).toBe(40);
    expect(valueAt(SERIES, 20)).toBe(30);
  });

  it('has no value outside the series', () => {
    expect(valueAt(SERIES, -1)).toBeNaN();
    expect(valueAt(SERIES, 20.001)).toBeNaN();
    expect(valueAt({ timeS: [], valueC: [] }, 0)).toBeNaN();
  });

  it('finds the last point at or before a time', () => {
    expect(indexAtOrBefore(SERIES.timeS, -5)).toBe(-1);
    expect(indexAtOrBefore(SERIES.timeS, 0)).toBe(0);
    expect(indexAtOrBefore(SERIES.timeS, 19.9)).toBe(1);
    expect(indexAtOrBefore(SERIES.timeS, 99)).toBe(2);
  });

  it('keeps one point beyond each end of a view so lines reach the edges', () => {
    expect(visibleRange(SERIES, 12, 18)).toEqual({ start: 1, end: 2 });
    expect(visibleRange(SERIES, 0, 5)).toEqual({ start: 0, end: 1 });
  });

  it('takes the extremes over a view with its ends interpolated', () => {
    expect(extentIn(SERIES, 5, 15)).toEqual([30, 40]);
    expect(extentIn(SERIES, 12, 18)).toEqual([32, 38]);
  });

  it('reads a solved first-order step response back to within 0.01 K anywhere along it', () => {
    // One massless junction on a sink of 100 J/K with Rθsa 2 K/W: τ = R·C = 200 s, and the
    // sink follows Ta + P·Rsa·(1 − e^(−t/τ)) (lumped capacitance, Incropera & DeWitt §5.1–5.2).
    const doc = parseStudy({
      format: 'junctura-study',
      version: 1,
      title: 'RC step',
      ambient: { temperatureC: 25 },
      sinks: [{ id: 'S1', rthKPerW: 2, capacityJPerK: 100 }],
      devices: [{ id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 1 }, interface: { rthKPerW: 0.5 } }],
      profile: { segments: [{ durationS: 1000, powerW: { Q1: 10 } }] },
    });
    const sink = evaluateStudy(doc).series!['S1.sink'];
    for (const t of [1, 37.5, 200, 411.1, 999]) {
      assertInDelta(valueAt(sink, t), 25 + 10 * 2 * (1 - Math.exp(-t / 200)), 0.01, `sink at ${t} s`);
    }
  });
});
