import { allowedCurrent, checkOperatingPoints, soaBoundary, type SoaParameters } from '@/core/soa';
import { seededRandom } from '../../helpers/seeded-random';
import { assertInDelta } from '../../helpers/assert-in-delta';

// Hand-worked construction of PHYSICS.md §4 (bipolar SOA on log-log axes):
// Pmax = (Tj,max − Tc)/Rθjc; thermal line Ic = Pmax/Vce; second breakdown I0 (Vce/V0)^(−n).
const model: SoaParameters = {
  kind: 'parameters',
  transistor: 'bipolar',
  tjMaxC: 150,
  icMaxA: 15,
  vceoV: 100,
  rthJcKPerW: 1.5,
  secondBreakdown: { referenceVceV: 60, referenceIcA: 1.2, exponent: 2, derating: { kind: 'linear', fractionPerK: 0.005 } },
};
const dc = (caseC: number) => ({ caseC, pulseS: 'dc' as const });

describe('allowedCurrent on a parametric bipolar SOA', () => {
  it('follows the thermal line with Pmax = 83.3 W at Tc = 25 °C', () => {
    // PHYSICS.md §4: (150 − 25) / 1.5 = 83.33 W; at 20 V, 83.33 / 20 = 4.167 A.
    const a = allowedCurrent(model, 20, dc(25));
    expect(a.limit).toBe('thermal');
    assertInDelta(a.currentA * 20, 83.333, 1e-3, 'Pmax at 25 °C');
  });

  it('derates the thermal line to Pmax = 50 W at Tc = 75 °C', () => {
    // PHYSICS.md §4: (150 − 75) / 1.5 = 50 W; at 20 V, 2.5 A.
    const a = allowedCurrent(model, 20, dc(75));
    expect(a.limit).toBe('thermal');
    assertInDelta(a.currentA, 2.5, 1e-12, 'Ic at 20 V, 75 °C');
  });

  it('is held at Ic,max where the thermal line lies above it', () => {
    // 83.33 W / 2 V = 41.7 A > Ic,max = 15 A (PHYSICS.md §4, limit 1).
    const a = allowedCurrent(model, 2, dc(25));
    expect(a.limit).toBe('current');
    assertInDelta(a.currentA, 15, 1e-12, 'Ic,max at 2 V');
    const zero = allowedCurrent(model, 0, dc(25));
    expect(zero.limit).toBe('current');
    assertInDelta(zero.currentA, 15, 1e-12, 'Ic,max at 0 V');
  });

  it('follows the second-breakdown power law at high Vce, derated by its own factor', () => {
    // PHYSICS.md §4: Is/b = 1.2 (80/60)^−2 = 0.675 A at 25 °C (thermal line: 83.3/80 = 1.04 A).
    const cold = allowedCurrent(model, 80, dc(25));
    expect(cold.limit).toBe('second-breakdown');
    assertInDelta(cold.currentA, 1.2 * (80 / 60) ** -2, 1e-12, 'Is/b at 80 V');
    // Linear derating 0.5 %/K: at 75 °C keeps 0.75 → 0.50625 A (thermal line 50/80 = 0.625 A).
    const hot = allowedCurrent(model, 80, dc(75));
    expect(hot.limit).toBe('second-breakdown');
    assertInDelta(hot.currentA, 0.50625, 1e-12, 'Is/b at 80 V, 75 °C');
    // Power law: a factor 1.4 in Vce (70 → 98 V) divides the current by 1.4^n = 1.96.
    const r = allowedCurrent(model, 70, dc(25)).currentA / allowedCurrent(model, 98, dc(25)).currentA;
    assertInDelta(r, 1.96, 1e-12, 'power-law ratio over a factor 1.4 in Vce');
  });

  it('allows nothing above Vceo', () => {
    expect(allowedCurrent(model, 100.01, dc(25))).toEqual({ currentA: 0, limit: 'voltage' });
  });

  it('allows nothing once the case reaches Tj,max', () => {
    expect(allowedCurrent(model, 20, dc(150))).toEqual({ currentA: 0, limit: 'thermal' });
  });

  it('rejects a negative Vce and a bad model field by name', () => {
    expect(() => allowedCurrent(model, -1, dc(25))).toThrow(/vceV/);
    expect(() => allowedCurrent({ ...model, rthJcKPerW: 0 }, 10, dc(25))).toThrow(/model\.rthJcKPerW/);
    expect(() => allowedCurrent(model, 10, { caseC: Number.NaN, pulseS: 'dc' })).toThrow(/condition\.caseC/);
  });
});

describe('allowedCurrent for a pulse, from Zθjc(tp) of a Foster set', () => {
  // Foster step response Zth(t) = Σ Ri (1 − e^(−t/τi)) (PHYSICS.md §3), ΣRi = Rθjc = 1.5 K/W.
  const terms = [
    { rKPerW: 0.3, tauS: 1e-3 },
    { rKPerW: 0.5, tauS: 1e-2 },
    { rKPerW: 0.7, tauS: 1e-1 },
  ];
  // A 1 ms second-breakdown line ten times the DC one keeps it out of the way at 50 V.
  const pulsed: SoaParameters = {
    ...model,
    zthJc: terms,
    icPulseMaxA: 30,
    secondBreakdown: { ...model.secondBreakdown!, pulses: [{ pulseS: 1e-3, referenceIcA: 12 }] },
  };
  // Hand-worked: Zth(1 ms) = 0.3·0.632121 + 0.5·0.0951626 + 0.7·0.00995017 = 0.244183 K/W.
  const z1ms = 0.244183;

  it('uses Pmax = (Tj,max − Tc)/Zθjc(tp) on the thermal line', () => {
    const a = allowedCurrent(pulsed, 50, { caseC: 25, pulseS: 1e-3 });
    expect(a.limit).toBe('thermal');
    assertInDelta(a.currentA * 50, 125 / z1ms, 0.01, 'pulse Pmax at 1 ms');
  });

  it('takes the pulse current rating Icm for pulses and Ic,max at DC', () => {
    const pulse = allowedCurrent(pulsed, 1, { caseC: 25, pulseS: 1e-3 });
    expect(pulse.limit).toBe('current');
    assertInDelta(pulse.currentA, 30, 1e-12, 'Icm');
    const steady = allowedCurrent(pulsed, 1, dc(25));
    expect(steady.limit).toBe('current');
    assertInDelta(steady.currentA, 15, 1e-12, 'Ic,max');
  });

  it('uses the DC second-breakdown line for a pulse longer than any pulse line', () => {
    // 5 ms is not covered by the 1 ms line: Is/b = 1.2 (50/60)^−2 = 1.728 A (PHYSICS.md §4).
    const a = allowedCurrent(pulsed, 50, { caseC: 25, pulseS: 5e-3 });
    expect(a.limit).toBe('second-breakdown');
    assertInDelta(a.currentA, 1.728, 1e-12, 'DC Is/b for a 5 ms pulse');
  });

  it('gives the same line from a Zθjc function as from its Foster terms', () => {
    const fn = { zthKPerW: (t: number) => terms.reduce((z, x) => z + x.rKPerW * (1 - Math.exp(-t / x.tauS)), 0), largestTauS: 0.1 };
    const a = allowedCurrent(pulsed, 50, { caseC: 60, pulseS: 3e-3 });
    const b = allowedCurrent({ ...pulsed, zthJc: fn }, 50, { caseC: 60, pulseS: 3e-3 });
    assertInDelta(b.currentA, a.currentA, 1e-12 * a.currentA, 'Ic from a Zth function');
  });
});

describe('soaBoundary on a parametric bipolar SOA', () => {
  it('bends where the limits cross: Pmax/Ic,max and the thermal / second-breakdown crossing', () => {
    const b = soaBoundary(model, dc(25), { vceMinV: 1 });
    expect(b.segments.map((s) => s.limit)).toEqual(['current', 'thermal', 'second-breakdown', 'voltage']);
    const [current, thermal, sb, vertical] = b.segments;
    // Hand-worked: corner at 83.33 / 15 = 5.556 V.
    assertInDelta(current.points[current.points.length - 1].vceV, 83.3333 / 15, 1e-4, 'current/thermal corner');
    // P/V = I0 (V/V0)^−2 → V = I0 V0² / P = 1.2 · 3600 / 83.33 = 51.84 V.
    assertInDelta(thermal.points[thermal.points.length - 1].vceV, 51.84, 1e-9, 'thermal/second-breakdown corner');
    assertInDelta(sb.points[sb.points.length - 1].vceV, 100, 1e-12, 'end at Vceo');
    assertInDelta(sb.points[sb.points.length - 1].icA, 1.2 * (100 / 60) ** -2, 1e-12, 'Is/b at Vceo');
    expect(vertical.points[0].vceV).toBe(100);
    expect(vertical.points[1].vceV).toBe(100);
    expect(vertical.points[1].icA).toBeLessThan(vertical.points[0].icA);
  });

  it('moves the thermal corner down at a hotter case', () => {
    // At 75 °C Pmax = 50 W: corner at 50 / 15 = 3.333 V; crossing with Is/b·0.75 at 1.2·0.75·3600/50 = 64.8 V.
    const b = soaBoundary(model, dc(75), { vceMinV: 1 });
    const thermal = b.segments.find((s) => s.limit === 'thermal')!;
    assertInDelta(thermal.points[0].vceV, 50 / 15, 1e-9, 'corner at 75 °C');
    assertInDelta(thermal.points[thermal.points.length - 1].vceV, 64.8, 1e-9, 'crossing at 75 °C');
  });
});

describe('checkOperatingPoints on a parametric SOA', () => {
  it('gives each point the same allowed current and limit as allowedCurrent on the boundary pieces', () => {
    // Reference: allowedCurrent, the lowest of the boundary's straight pieces (PHYSICS.md §4);
    // checkOperatingPoints takes the same lines without building the pieces, so the bits agree.
    const rand = seededRandom(23);
    const pulsed: SoaParameters = {
      ...model,
      icPulseMaxA: 25,
      zthJc: [
        { rKPerW: 0.3, tauS: 0.0005 },
        { rKPerW: 1.2, tauS: 0.02 },
      ],
      secondBreakdown: { ...model.secondBreakdown!, pulses: [{ pulseS: 0.01, referenceIcA: 3 }, { pulseS: 0.001, referenceIcA: 6 }, { pulseS: 0.001, referenceIcA: 5 }] },
    };
    for (const m of [model, pulsed, { ...model, secondBreakdown: undefined }]) {
      const points = Array.from({ length: 400 }, (_, i) => ({
        timeS: i,
        durationS: i % 5 === 0 ? 0 : Math.pow(10, -5 + 6 * rand()),
        vceV: i % 37 === 0 ? 0 : i % 41 === 0 ? 120 : 110 * rand(),
        icA: 0.01 + 5 * rand(),
        caseC: i % 53 === 0 ? 160 : -20 + 150 * rand(),
      }));
      const check = checkOperatingPoints(m, points);
      points.forEach((p, k) => {
        const a = allowedCurrent(m, p.vceV, { caseC: p.caseC, pulseS: p.durationS === 0 ? Number.MIN_VALUE : check.pulses[k] });
        expect(check.allowedA[k]).toBe(a.currentA);
        expect(check.limits[k]).toBe(a.limit);
      });
    }
  });
});
