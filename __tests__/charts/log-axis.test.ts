import { formatLogValue, formatReading, formatTimeTick, logDomain, logSpaced, logTicks, niceAbove, niceBelow } from '@/charts/log-axis';

import { assertInRelDelta } from '../helpers/assert-in-delta';

describe('log axis', () => {
  it('rounds the ends of a domain outward to 1, 2 or 5 × 10^k', () => {
    // The 1-2-5 series of round chart values (common practice for instrument and chart scales).
    expect(niceBelow(0.6)).toBe(0.5);
    expect(niceBelow(0.0249)).toBe(0.02);
    expect(niceBelow(3)).toBe(2);
    expect(niceBelow(10)).toBe(10);
    expect(niceAbove(140)).toBe(200);
    expect(niceAbove(60)).toBe(100);
    expect(niceAbove(2)).toBe(2);
    expect(niceAbove(2.01)).toBe(5);
    expect(logDomain(0.6, 140)).toEqual([0.5, 200]);
  });

  it('gives a single value a decade around it', () => {
    // √10 either side of 1 spans one decade: log10(√10) = 0.5 (definition of the logarithm).
    expect(logDomain(1, 1)).toEqual([0.2, 5]);
    expect(() => logDomain(0, 1)).toThrow(/min: must be a finite number above 0, got 0/);
  });

  it('marks every 1…9 × 10^k and labels the decades on a narrow axis', () => {
    // 0.5 … 200 holds 0.5–0.9 (5 marks), 1–9, 10–90 (9 each), 100 and 200: 25 marks.
    const ticks = logTicks([0.5, 200], 266);
    expect(ticks).toHaveLength(25);
    expect(ticks.filter((t) => t.labelled).map((t) => t.value)).toEqual([1, 10, 100]);
    // 3 × 10^-1 written exactly, not as 0.30000000000000004 (IEEE 754 rounding of 3 × 0.1).
    expect(logTicks([0.2, 1], 300).map((t) => t.value)).toEqual([0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1]);
  });

  it('labels 2 and 5 too once a decade is wide, and every second decade when they are crowded', () => {
    // 700 px over log10(200 / 0.5) = 2.6 decades is 269 px a decade.
    expect(logTicks([0.5, 200], 700).filter((t) => t.labelled).map((t) => t.value)).toEqual([0.5, 1, 2, 5, 10, 20, 50, 100, 200]);
    // 6 decades in 180 px: 30 px a decade, under the 44 px a label needs, so every second one.
    expect(logTicks([1e-5, 10], 180).filter((t) => t.labelled).map((t) => t.value)).toEqual([1e-4, 0.01, 1]);
    // Up the side a label is one line high: 266 px / 2.6 decades = 102 px clears a 64 px threshold.
    expect(logTicks([0.5, 200], 266, 22, 64).filter((t) => t.labelled).map((t) => t.value)).toEqual([0.5, 1, 2, 5, 10, 20, 50, 100, 200]);
  });

  it('still reads at two labels when the domain holds less than a decade', () => {
    expect(logTicks([2, 5], 300).filter((t) => t.labelled).map((t) => t.value)).toEqual([2, 5]);
    expect(logTicks([3, 4], 300).filter((t) => t.labelled).map((t) => t.value)).toEqual([3, 4]);
  });

  it('writes times with SI prefixes and plain values as decimals', () => {
    // Prefixes micro, milli (BIPM SI Brochure, 9th edition, Table 7).
    expect(formatTimeTick(1e-4)).toBe('100\u00a0µs');
    expect(formatTimeTick(0.002)).toBe('2\u00a0ms');
    expect(formatTimeTick(10)).toBe('10\u00a0s');
    expect(formatLogValue(0.02)).toBe('0.02');
    expect(formatLogValue(200)).toBe('200');
    expect(formatLogValue(1e-7)).toBe('1e-7');
    expect(formatReading(7.5312)).toBe('7.53');
  });

  it('spreads times evenly in log: the middle of three is the geometric mean of the ends', () => {
    const t = logSpaced(1e-3, 10, 3);
    // √(10^-3 · 10) = 0.1 (geometric mean).
    assertInRelDelta(t[1], 0.1, 1e-12, 'middle');
    expect([t[0], t[2]]).toEqual([1e-3, 10]);
    expect(() => logSpaced(1, 10, 1)).toThrow(/n: must be a whole number of 2 or more/);
  });
});
