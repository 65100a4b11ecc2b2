import { checkOperatingPoints, operatingPointFromDrive, pulseFor, SOA_DC_TAU_FACTOR, type SoaParameters } from '@/core/soa';
import { assertInDelta } from '../../helpers/assert-in-delta';

// PHYSICS.md §4 construction: Pmax = (150 − Tc)/1.5 W; Is/b = 1.2 (Vce/60)^−2 A derated 0.5 %/K.
const bipolar: SoaParameters = {
  kind: 'parameters',
  transistor: 'bipolar',
  tjMaxC: 150,
  icMaxA: 15,
  vceoV: 100,
  rthJcKPerW: 1.5,
  zthJc: [
    { rKPerW: 0.3, tauS: 1e-3 },
    { rKPerW: 0.5, tauS: 1e-2 },
    { rKPerW: 0.7, tauS: 1e-1 },
  ],
  secondBreakdown: { referenceVceV: 60, referenceIcA: 1.2, exponent: 2, derating: { kind: 'linear', fractionPerK: 0.005 } },
};

describe('checkOperatingPoints', () => {
  const points = [
    { timeS: 0, durationS: 60, vceV: 20, icA: 2, caseC: 25 },
    { timeS: 60, durationS: 60, vceV: 20, icA: 2, caseC: 75 },
    { timeS: 120, durationS: 60, vceV: 80, icA: 0.6, caseC: 75 },
    { timeS: 180, durationS: 60, vceV: 2, icA: 0, caseC: 80 },
  ];
  const result = checkOperatingPoints(bipolar, points);

  it('gives each point its margin Iallowed / Ic at its own case temperature', () => {
    // Hand-worked: 83.33/20 / 2 = 2.083; 50/20 / 2 = 1.25; 1.2·(80/60)^−2·0.75 / 0.6 = 0.84375.
    assertInDelta(result.margin[0], 83.3333 / 20 / 2, 1e-4, 'margin at 25 °C');
    assertInDelta(result.margin[1], 1.25, 1e-12, 'margin at 75 °C');
    assertInDelta(result.margin[2], 0.84375, 1e-12, 'margin in second breakdown');
    expect(result.margin[3]).toBe(Infinity);
    expect(result.limits).toEqual(['thermal', 'thermal', 'second-breakdown', 'current']);
  });

  it('reports the worst point, when it happens, and fails the check', () => {
    expect(result.worst).toMatchObject({ index: 2, timeS: 120, limit: 'second-breakdown', pulseS: 'dc' });
    expect(result.failedCount).toBe(1);
    expect(result.passed).toBe(false);
    expect(result.warnings).toEqual([]);
  });

  it('passes when every margin is at least 1', () => {
    const ok = checkOperatingPoints(bipolar, points.slice(0, 2));
    expect(ok.passed).toBe(true);
    expect(ok.worst?.index).toBe(1);
  });

  it('checks a short stretch against the pulse line of Zθjc(tp)', () => {
    // 1 ms at 50 V: Pmax = 125 / Zth(1 ms) = 125 / 0.244183 = 511.9 W → 10.24 A, more than the DC 1.67 A.
    const [p] = [{ timeS: 3, durationS: 1e-3, vceV: 50, icA: 5, caseC: 25 }];
    const pulsed = { ...bipolar, secondBreakdown: undefined };
    const r = checkOperatingPoints(pulsed, [p]);
    expect(r.pulses[0]).toBe(1e-3);
    assertInDelta(r.allowedA[0], 125 / 0.244183 / 50, 1e-3, 'pulse allowance');
  });

  it('treats a stretch as DC from SOA_DC_TAU_FACTOR of the largest τ on', () => {
    expect(SOA_DC_TAU_FACTOR).toBeGreaterThanOrEqual(3); // "a few" time constants (PHYSICS.md §4)
    expect(pulseFor(bipolar, SOA_DC_TAU_FACTOR * 0.1)).toBe('dc');
    expect(pulseFor(bipolar, 0.49)).toBe(0.49);
    expect(pulseFor({ ...bipolar, zthJc: undefined }, 1e-3)).toBe('dc');
  });

  it('names the point at fault in bad input', () => {
    expect(() => checkOperatingPoints(bipolar, [{ ...points[0], icA: -1 }])).toThrow(/points\[0\]\.icA/);
    expect(() => checkOperatingPoints(bipolar, [points[0], { ...points[1], caseC: Number.NaN }])).toThrow(/points\[1\]\.caseC/);
  });

  it('returns no worst point and passes for an empty list', () => {
    const r = checkOperatingPoints(bipolar, []);
    expect(r.worst).toBeNull();
    expect(r.passed).toBe(true);
  });
});

describe('operatingPointFromDrive', () => {
  it('takes Vce = Vin − Vout and Ic = Iload / n (PHYSICS.md §4)', () => {
    const p = operatingPointFromDrive({ timeS: 0, durationS: 1, vinV: 24.68, voutV: 9.5, iloadA: 5, parts: 2, caseC: 40 });
    assertInDelta(p.vceV, 15.18, 1e-12, 'Vce');
    expect(p.icA).toBe(2.5);
    expect(() => operatingPointFromDrive({ timeS: 0, durationS: 1, vinV: 5, voutV: 6, iloadA: 1, parts: 1, caseC: 40 })).toThrow(/voutV/);
  });
});

describe('MOSFET linear-mode warning (PHYSICS.md §4; Spirito et al., ISPSD 2002, from memory)', () => {
  const mosfet: SoaParameters = { ...bipolar, transistor: 'mosfet', secondBreakdown: undefined };
  const dcPoint = { timeS: 7, durationS: 100, vceV: 10, icA: 1, caseC: 40 };
  const pulsePoint = { timeS: 2, durationS: 1e-3, vceV: 10, icA: 1, caseC: 40 };

  it('warns when a MOSFET without a DC linear-mode rating works at DC', () => {
    const r = checkOperatingPoints(mosfet, [pulsePoint, dcPoint]);
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0]).toMatchObject({ code: 'mosfet-linear-mode', count: 1, firstIndex: 1, firstTimeS: 7 });
    expect(r.warnings[0].message).toMatch(/linear mode/);
  });

  it('does not warn with a DC linear-mode rating, for a bipolar part, or for a rated pulse', () => {
    expect(checkOperatingPoints({ ...mosfet, linearMode: { dcRated: true } }, [dcPoint]).warnings).toEqual([]);
    expect(checkOperatingPoints({ ...mosfet, transistor: 'bipolar' }, [dcPoint]).warnings).toEqual([]);
    const rated = { ...mosfet, linearMode: { dcRated: false, longestRatedPulseS: 1e-2 } };
    expect(checkOperatingPoints(rated, [pulsePoint]).warnings).toEqual([]);
  });

  it('warns for a pulse longer than the longest rated linear-mode pulse', () => {
    const rated = { ...mosfet, linearMode: { dcRated: false, longestRatedPulseS: 1e-4 } };
    const r = checkOperatingPoints(rated, [pulsePoint]);
    expect(r.warnings.map((w) => w.code)).toEqual(['mosfet-linear-mode']);
  });
});
