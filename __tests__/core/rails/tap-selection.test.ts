import { nextTap, selectTaps, tapWithoutHistory } from '@/core/rails';

// PHYSICS.md §2: up to tap k+1 above θk + h/2, down below θk − h/2.
const t = { thresholdsV: [9.5, 20.5], hysteresisV: 1 };

describe('selectTaps with hysteresis', () => {
  const up = Array.from({ length: 61 }, (_, k) => k * 0.5); // 0 … 30 V
  const sweep = [...up, ...up.slice(0, -1).reverse()]; // then back to 0 V
  const { taps, changes } = selectTaps(t, sweep);
  const at = (v: number, rising: boolean) => taps[rising ? v / 0.5 : 120 - v / 0.5];

  it('goes up only above θk + h/2 on the rising sweep', () => {
    expect([at(9.5, true), at(10, true), at(10.5, true)]).toEqual([0, 0, 1]);
    expect([at(20.5, true), at(21, true), at(21.5, true)]).toEqual([1, 1, 2]);
  });

  it('comes down only below θk − h/2 on the falling sweep', () => {
    expect([at(21, false), at(20, false), at(19.5, false)]).toEqual([2, 2, 1]);
    expect([at(9.5, false), at(9, false), at(8.5, false)]).toEqual([1, 1, 0]);
  });

  it('lists each change once, at the sample where it happens', () => {
    expect(changes).toEqual([
      { index: 21, from: 0, to: 1 },
      { index: 43, from: 1, to: 2 },
      { index: 81, from: 2, to: 1 },
      { index: 103, from: 1, to: 0 },
    ]);
    expect(sweep[21]).toBe(10.5);
    expect(sweep[81]).toBe(19.5);
  });

  it('starts from the stated tap, and jumps several bands at once', () => {
    // 20.2 V lies inside the band 20 … 21 V: the selector keeps what it had.
    expect(Array.from(selectTaps(t, [20.2], 2).taps)).toEqual([2]);
    expect(Array.from(selectTaps(t, [20.2], 1).taps)).toEqual([1]);
    expect(Array.from(selectTaps(t, [20.2], 0).taps)).toEqual([1]);
    expect(nextTap(t, 0, 25)).toBe(2);
    expect(nextTap(t, 2, 1)).toBe(0);
    expect(tapWithoutHistory(t, 9.6)).toBe(1);
  });

  it('rejects bad input by name', () => {
    expect(() => selectTaps(t, [1, Number.NaN])).toThrow(/sensedV\[1\]/);
    expect(() => selectTaps(t, [1], 3)).toThrow(/initialTap/);
    expect(() => selectTaps({ thresholdsV: [9.5, 10], hysteresisV: 1 }, [1])).toThrow(/thresholdsV\[1\]/);
  });
});
