import { formatTimeAt, timeTicks, timeUnitFor } from '@/charts/time-axis';

describe('time axis', () => {
  it('picks seconds below 2 min, minutes below 2 h and hours above', () => {
    expect(timeUnitFor(0).symbol).toBe('s');
    expect(timeUnitFor(119.9).symbol).toBe('s');
    expect(timeUnitFor(120).symbol).toBe('min');
    expect(timeUnitFor(7199).symbol).toBe('min');
    expect(timeUnitFor(7200).symbol).toBe('h');
  });

  it('refuses a negative or missing span with the reason', () => {
    expect(() => timeUnitFor(-1)).toThrow(/spanS: must be a number ≥ 0, got -1/);
    expect(() => timeUnitFor(NaN)).toThrow(RangeError);
  });

  it('labels a 3 min run in whole minutes and places the ticks at 60 s steps', () => {
    // 1 min = 60 s (BIPM SI Brochure, Table 8). Over 0–3 min with about 4 ticks the nice step
    // is 1 (steps are 1, 2 or 5 × 10^k: d3-array "ticks" documentation).
    const { unit, ticks } = timeTicks(0, 180, 4);
    expect(unit.symbol).toBe('min');
    expect(ticks.map((t) => t.value)).toEqual([0, 60, 120, 180]);
    expect(ticks.map((t) => t.label)).toEqual(['0', '1', '2', '3']);
  });

  it('gives decimals only when the step needs them', () => {
    // 0–35 s with about 7 ticks: 35 / 7 = 5, a nice step of 5 s (d3-array "ticks").
    expect(timeTicks(0, 35, 7).ticks.map((t) => t.label)).toEqual(['0', '5', '10', '15', '20', '25', '30', '35']);
    // 0–1.5 s with about 3 ticks: 0.5 s steps, one decimal.
    expect(timeTicks(0, 1.5, 3).ticks.map((t) => t.label)).toEqual(['0.0', '0.5', '1.0', '1.5']);
    // 10 h in hours: 36,000 s / 3600 s per h (BIPM SI Brochure, Table 8).
    const hours = timeTicks(0, 36_000, 5);
    expect(hours.unit.symbol).toBe('h');
    expect(hours.ticks.map((t) => t.value)).toEqual([0, 7200, 14_400, 21_600, 28_800, 36_000]);
  });

  it('reads a time to about three significant digits of the visible span', () => {
    // 160 s = 2.667 min (÷ 60); over a 3 min span two decimals of a minute.
    expect(formatTimeAt(160, 180)).toBe('2.67\u00a0min');
    expect(formatTimeAt(12.34, 35)).toBe('12.3\u00a0s');
    expect(formatTimeAt(0.0123, 0.5)).toBe('0.012\u00a0s');
    // 5400 s = 1.5 h (÷ 3600); over a 10 h span one decimal of an hour.
    expect(formatTimeAt(5400, 36_000)).toBe('1.5\u00a0h');
  });
});
