import { compileRailPlan, tapCapability, tapVoltage, type RailPlan } from '@/core/rails';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { leaf, source, tradePlan } from './trade-scenario';

const oneTap = (circuit: RailPlan['taps'][number]['circuit'], sources = [source('a'), source('b'), source('c')]) =>
  compileRailPlan({ sources, taps: [{ name: 't', circuit }], thresholdsV: [], hysteresisV: 0, sensed: 'set-point' });

describe('tap circuits (PHYSICS.md §2)', () => {
  it('adds voltages and resistances in series and takes the smallest rating', () => {
    const m = oneTap({ kind: 'series', parts: [leaf('a'), leaf('b')] }, [source('a'), { ...source('b'), imaxA: 2 }]);
    // Series: V = 2 Voc − I (Rs + Rs) = 25.18 − 0.2 I.
    for (const i of [0, 1, 2]) assertInDelta(tapVoltage(m, 0, i), 25.18 - 0.2 * i, 1e-12, `V at ${i} A`);
    expect(tapCapability(m, 0)).toMatchObject({ capabilityA: 2, limitedBy: 'b', shareErrorA: 0 });
  });

  it('gives Voc − I (Rs + Rb)/n − Vd for n equal branches in parallel', () => {
    const m = oneTap({
      kind: 'parallel',
      branches: ['a', 'b', 'c'].map((id) => ({ ...leaf(id), diodeV: 0.7, ballastOhm: 0.05 })),
    });
    for (const i of [0.5, 3, 7.5]) assertInDelta(tapVoltage(m, 0, i), 12.59 - (i * 0.15) / 3 - 0.7, 1e-12, `V at ${i} A`);
    // Capability adds: 3 × 2.5 A with matched branches.
    assertInDelta(tapCapability(m, 0).capabilityA, 7.5, 1e-12, 'capability');
  });

  it('lets only the higher branch conduct until the common voltage falls to the lower one (diodes block)', () => {
    // Hand-worked with Kirchhoff's current law: E_a = 11.9 V, E_b = 11.7 V, 0.15 Ω each.
    // Below (11.9 − 11.7)/0.15 = 1.333 A only a conducts: V = 11.9 − 0.15 I; above, V = 11.8 − 0.075 I.
    const m = oneTap(
      {
        kind: 'parallel',
        branches: [
          { ...leaf('a'), diodeV: 0.69, ballastOhm: 0.05 },
          { ...leaf('b'), diodeV: 0.89, ballastOhm: 0.05 },
        ],
      },
    );
    assertInDelta(tapVoltage(m, 0, 0), 11.9, 1e-12, 'open circuit');
    assertInDelta(tapVoltage(m, 0, 1), 11.75, 1e-12, 'V at 1 A');
    assertInDelta(tapVoltage(m, 0, 3), 11.8 - 0.075 * 3, 1e-12, 'V at 3 A');
    // a reaches 2.5 A at V = 11.9 − 0.375 = 11.525 V, when b gives (11.7 − 11.525)/0.15 = 1.1667 A.
    expect(tapCapability(m, 0).limitedBy).toBe('a');
    assertInDelta(tapCapability(m, 0).capabilityA, 2.5 + 0.175 / 0.15, 1e-12, 'capability of a mismatched pair');
  });

  it('takes the share error of a stated mismatch off the parallel capability', () => {
    // Hand-worked (Kirchhoff): the high branch at Imax leaves the other at Imax − ΔV/R,
    // so n = 2 gives 2 Imax − ΔV/R = 5 − 0.1/0.15 A; PHYSICS.md §1 puts the share error at ≈ ΔV/R.
    const m = oneTap({
      kind: 'parallel',
      mismatchV: 0.1,
      branches: ['a', 'b'].map((id) => ({ ...leaf(id), diodeV: 0.7, ballastOhm: 0.05 })),
    });
    const c = tapCapability(m, 0);
    assertInDelta(c.capabilityA, 5 - 0.1 / 0.15, 1e-12, 'capability with share error');
    assertInDelta(c.shareErrorA, 0.1 / 0.15, 1e-12, 'share error');
  });

  it('names the field at fault', () => {
    expect(() => oneTap({ kind: 'source', source: 'x' })).toThrow(/plan\.taps\[0\]\.circuit\.source: no source named "x"/);
    expect(() => oneTap({ kind: 'series', parts: [leaf('a'), leaf('a')] })).toThrow(/parts\[1\]\.source: "a" appears twice/);
    const stiff = [{ ...source('a'), rsOhm: 0 }, { ...source('b'), rsOhm: 0 }];
    expect(() => oneTap({ kind: 'parallel', branches: [leaf('a'), leaf('b')] }, stiff)).toThrow(
      /branches\[0\]: needs a resistance/,
    );
    expect(() => compileRailPlan({ ...tradePlan, thresholdsV: [9.5] })).toThrow(/plan\.thresholdsV: 3 taps need 2 thresholds/);
    expect(() => compileRailPlan({ ...tradePlan, taps: [...tradePlan.taps].reverse() })).toThrow(/plan\.taps\[1\]: its open-circuit voltage/);
    expect(() => compileRailPlan({ ...tradePlan, sources: [{ ...source('a'), imaxA: 0 }] })).toThrow(/plan\.sources\[0\]\.imaxA/);
  });
});

describe('the three-source plan of the trade facts (common practice)', () => {
  const m = compileRailPlan(tradePlan);

  it('supplies at least 5 A from two in parallel with ballast and protection diodes', () => {
    // Common practice: two 2.5 A sources in parallel supply at least 5 A (matched, no share error).
    expect(tapCapability(m, 0).capabilityA).toBeGreaterThanOrEqual(5 - 1e-12);
  });

  it('supplies 2.5 A from two in series', () => {
    // Common practice: series sources supply the smallest rating.
    assertInDelta(tapCapability(m, 1).capabilityA, 2.5, 0, 'series capability');
  });

  it('delivers ≈ 24.68 V with two in series and ≈ 37 V with three at 2.5 A', () => {
    // Common practice (measured regulator inputs); the scenario's Voc and Rs are chosen to match.
    assertInDelta(tapVoltage(m, 1, 2.5), 24.68, 0.005, 'two in series');
    assertInDelta(tapVoltage(m, 2, 2.5), 37, 0.05, 'three in series');
  });
});
