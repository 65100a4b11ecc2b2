import { allowedCurrent, soaBoundary, type SoaParameters, type SoaPoints } from '@/core/soa';
import { assertInDelta } from '../../helpers/assert-in-delta';

// PHYSICS.md §4 construction (Tj,max 150 °C, Rθjc 1.5 K/W → Pmax 83.33 W at 25 °C), drawn as
// datasheet points: corners hand-worked from the formulas, ending with the vertical at Vceo.
const parametric: SoaParameters = {
  kind: 'parameters',
  transistor: 'bipolar',
  tjMaxC: 150,
  icMaxA: 15,
  vceoV: 100,
  rthJcKPerW: 1.5,
  secondBreakdown: { referenceVceV: 60, referenceIcA: 1.2, exponent: 2, derating: { kind: 'linear', fractionPerK: 0.005 } },
};
const pmax = 125 / 1.5;
const sbAt = (v: number) => 1.2 * (v / 60) ** -2;
const datasheet: SoaPoints = {
  kind: 'points',
  transistor: 'bipolar',
  tjMaxC: 150,
  secondBreakdownDerating: { kind: 'linear', fractionPerK: 0.005 },
  curves: [
    {
      pulseS: 'dc',
      points: [
        { vceV: 1, icA: 15 },
        { vceV: pmax / 15, icA: 15 },
        { vceV: (1.2 * 3600) / pmax, icA: pmax / ((1.2 * 3600) / pmax) },
        { vceV: 100, icA: sbAt(100) },
        { vceV: 100, icA: 0 },
      ],
    },
  ],
};
const dc = (caseC: number) => ({ caseC, pulseS: 'dc' as const });

describe('allowedCurrent on datasheet points', () => {
  it('interpolates in log-log exactly on a power law', () => {
    // A straight line in log-log is I = a V^s; points on I = 40 V^−1.5 give it back between them.
    const law = (v: number) => 40 * v ** -1.5;
    const m: SoaPoints = {
      kind: 'points',
      transistor: 'bipolar',
      tjMaxC: 150,
      curves: [{ pulseS: 'dc', points: [2, 7, 30].map((v) => ({ vceV: v, icA: law(v) })) }],
    };
    for (const v of [2.5, 4, 6.9, 11, 29]) assertInDelta(allowedCurrent(m, v, dc(25)).currentA, law(v), 1e-12 * law(v), `Ic at ${v} V`);
    expect(allowedCurrent(m, 4, dc(25)).limit).toBe('second-breakdown');
  });

  it('matches the parametric SOA it was drawn from, at 25 °C and derated at 75 and 110 °C', () => {
    // Thermal segments derate as (Tj,max − Tc)/(Tj,max − 25) (PHYSICS.md §4), second breakdown by its own factor.
    for (const caseC of [25, 75, 110]) {
      for (const v of [0.5, 1.5, 3, 5, 10, 30, 51, 60, 90, 100]) {
        const a = allowedCurrent(datasheet, v, dc(caseC));
        const b = allowedCurrent(parametric, v, dc(caseC));
        expect(`${a.limit} at ${v} V, ${caseC} °C`).toBe(`${b.limit} at ${v} V, ${caseC} °C`);
        assertInDelta(a.currentA, b.currentA, 1e-9 * b.currentA, `Ic at ${v} V, ${caseC} °C`);
      }
    }
  });

  it('derates second breakdown like the thermal line when no derating is given (conservative)', () => {
    const { secondBreakdownDerating: _, ...plain } = datasheet;
    // At 75 °C the thermal factor is 75/125 = 0.6 (below the 0.75 of the stated derating).
    assertInDelta(allowedCurrent(plain, 90, dc(75)).currentA, 0.6 * sbAt(90), 1e-12, 'Is/b at 90 V, 75 °C');
  });

  it('picks the shortest rated pulse at least as long as the one asked for', () => {
    const m: SoaPoints = {
      ...datasheet,
      curves: [
        ...datasheet.curves,
        { pulseS: 1e-3, points: [{ vceV: 1, icA: 30 }, { vceV: 10, icA: 30 }, { vceV: 100, icA: 3 }] },
      ],
    };
    assertInDelta(allowedCurrent(m, 50, { caseC: 25, pulseS: 5e-4 }).currentA, 6, 1e-12, '1 ms curve for 0.5 ms');
    assertInDelta(allowedCurrent(m, 50, { caseC: 25, pulseS: 2e-3 }).currentA, pmax / 50, 1e-9, 'DC curve for 2 ms');
    const noDc: SoaPoints = { ...m, curves: [m.curves[1]] };
    expect(() => allowedCurrent(noDc, 50, dc(25))).toThrow(/no DC curve/);
    expect(() => allowedCurrent(noDc, 50, { caseC: 25, pulseS: 0.01 })).toThrow(/no curve covers a pulse of 0\.01 s/);
  });

  it('allows nothing beyond the last point (the voltage limit)', () => {
    expect(allowedCurrent(datasheet, 101, dc(25))).toEqual({ currentA: 0, limit: 'voltage' });
  });

  it('rejects a rising current and unordered voltages, naming the point', () => {
    const bad = (points: SoaPoints['curves'][number]['points']): SoaPoints => ({ ...datasheet, curves: [{ pulseS: 'dc', points }] });
    expect(() => allowedCurrent(bad([{ vceV: 1, icA: 5 }, { vceV: 2, icA: 6 }]), 1, dc(25))).toThrow(
      /model\.curves\[0\]\.points\[1\]\.icA: must not rise/,
    );
    expect(() => allowedCurrent(bad([{ vceV: 2, icA: 5 }, { vceV: 1, icA: 4 }]), 1, dc(25))).toThrow(
      /model\.curves\[0\]\.points\[1\]\.vceV: must rise/,
    );
    expect(() => allowedCurrent({ ...datasheet, tjMaxC: 25 }, 1, dc(25))).toThrow(/model\.tjMaxC/);
  });
});

describe('soaBoundary on datasheet points', () => {
  it('returns the datasheet corners at 25 °C, labelled by their slope', () => {
    const b = soaBoundary(datasheet, dc(25), { vceMinV: 1 });
    expect(b.segments.map((s) => s.limit)).toEqual(['current', 'thermal', 'second-breakdown', 'voltage']);
    const corners = b.segments.slice(0, 3).flatMap((s) => s.points.slice(1));
    const expected = datasheet.curves[0].points.slice(1, 4);
    expect(corners).toHaveLength(expected.length);
    corners.forEach((c, i) => {
      assertInDelta(c.vceV, expected[i].vceV, 1e-9 * expected[i].vceV, `corner ${i} Vce`);
      assertInDelta(c.icA, expected[i].icA, 1e-9 * expected[i].icA, `corner ${i} Ic`);
    });
  });
});
