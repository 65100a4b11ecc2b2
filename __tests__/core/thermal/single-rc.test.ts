import { advance, compileNetwork, firstCrossing, peakInSegment, runProfile, steadyState, zth } from '@/core/thermal';
import { assertInDelta, assertInRelDelta } from '../../helpers/assert-in-delta';

// One node of capacity C on a resistance R to the ambient: τ = RC.
const R = 2.5; // K/W
const C = 40; // J/K
const tau = R * C;
const Ta = 40; // °C
const P = 12; // W
const model = compileNetwork({
  nodes: [{ id: 'j', capacityJPerK: C }],
  links: [{ a: 'j', b: 'ambient', rKPerW: R }],
  heatInputs: ['j'],
});

describe('single RC', () => {
  it('step from ambient follows Ta + P R (1 − e^(−t/RC))', () => {
    for (const t of [0, 1e-6, 0.3 * tau, tau, 5 * tau, 40 * tau]) {
      const T = advance(model, [Ta], [P, Ta], t);
      // Textbook first-order step response.
      assertInRelDelta(T[0], Ta + P * R * (1 - Math.exp(-t / tau)), 1e-14, `T(${t})`);
    }
  });

  it('chained segments equal one segment of the summed length', () => {
    const once = advance(model, [Ta], [P, Ta], 0.7 * tau);
    let T: Float64Array = Float64Array.of(Ta);
    for (let i = 0; i < 7; i++) T = advance(model, T, [P, Ta], 0.1 * tau, T);
    // Same textbook formula at t = 0.7 τ; a time-stepping scheme would drift.
    assertInRelDelta(T[0], Ta + P * R * (1 - Math.exp(-0.7)), 1e-13, 'chained');
    assertInRelDelta(once[0], T[0], 1e-13, 'single');
  });

  it('steady state is Ta + P R', () => {
    // Ohm's-law analogue (textbook).
    assertInDelta(steadyState(model, [P, Ta])[0], Ta + P * R, 1e-12, 'steady');
  });

  it('zth is R (1 − e^(−t/τ)) and reaches R', () => {
    // Textbook single-pole thermal impedance.
    assertInRelDelta(zth(model, 0, 0, tau), R * (1 - Math.exp(-1)), 1e-14, 'Zth(τ)');
    assertInRelDelta(zth(model, 0, 0, 1e6 * tau), R, 1e-14, 'Zth(∞)');
    assertInDelta(zth(model, 0, 0, 0), 0, 1e-15, 'Zth(0)');
  });

  it('zero-length segment leaves the state unchanged', () => {
    expect(advance(model, [77], [P, Ta], 0)[0]).toBe(77);
    expect(peakInSegment(model, [77], [P, Ta], 0, 0)).toEqual({ valueC: 77, timeS: 0 });
  });

  it('firstCrossing up matches t = τ ln((T∞ − T0)/(T∞ − level))', () => {
    const T0 = 45;
    const Tinf = Ta + P * R;
    const level = 60;
    const t = firstCrossing(model, [T0], [P, Ta], 10 * tau, 0, level, 'up');
    // Closed form of the first-order step solved for t (textbook).
    assertInRelDelta(t as number, tau * Math.log((Tinf - T0) / (Tinf - level)), 1e-12, 'crossing time');
    expect(advance(model, [T0], [P, Ta], t as number)[0]).toBeGreaterThanOrEqual(level - 1e-12);
  });

  it('firstCrossing down on cooling matches the same closed form', () => {
    const T0 = 68;
    const level = 50;
    const t = firstCrossing(model, [T0], [0, Ta], 10 * tau, 0, level, 'down');
    // Cooling towards T∞ = Ta: t = τ ln((T0 − Ta)/(level − Ta)) (textbook).
    assertInRelDelta(t as number, tau * Math.log((T0 - Ta) / (level - Ta)), 1e-12, 'cooling time');
  });

  it('firstCrossing is null when the level is out of reach and 0 when already reached', () => {
    expect(firstCrossing(model, [45], [P, Ta], 10 * tau, 0, Ta + P * R + 1, 'up')).toBeNull();
    expect(firstCrossing(model, [45], [P, Ta], 0.01 * tau, 0, 60, 'up')).toBeNull();
    expect(firstCrossing(model, [65], [P, Ta], tau, 0, 60, 'up')).toBe(0);
  });

  it('thermal-shutdown cycling: on and off times follow τ ln(…) of the hysteresis band', () => {
    // Trip at 65 °C, resume at 55 °C; heating towards Ta + P R = 70 °C, cooling towards Ta.
    const trip = 65;
    const resume = 55;
    const Tinf = Ta + P * R;
    let T: Float64Array = Float64Array.of(Ta);
    const onTimes: number[] = [];
    const offTimes: number[] = [];
    for (let cycle = 0; cycle < 4; cycle++) {
      const on = firstCrossing(model, T, [P, Ta], 100 * tau, 0, trip, 'up') as number;
      T = advance(model, T, [P, Ta], on);
      onTimes.push(on);
      const off = firstCrossing(model, T, [0, Ta], 100 * tau, 0, resume, 'down') as number;
      T = advance(model, T, [0, Ta], off);
      offTimes.push(off);
    }
    // First-order step closed forms between the two thresholds (textbook).
    const onExpected = tau * Math.log((Tinf - resume) / (Tinf - trip));
    const offExpected = tau * Math.log((trip - Ta) / (resume - Ta));
    onTimes.slice(1).forEach((t, i) => assertInRelDelta(t, onExpected, 1e-10, `on time ${i + 1}`));
    offTimes.forEach((t, i) => assertInRelDelta(t, offExpected, 1e-10, `off time ${i}`));
    assertInRelDelta(onTimes[0], tau * Math.log((Tinf - Ta) / (Tinf - trip)), 1e-10, 'first on time');
  });

  it('runProfile of one long segment peaks at its end with the textbook value', () => {
    const result = runProfile(model, { durations: [3 * tau], inputs: [P, Ta] }, { watchNodes: [0] });
    assertInRelDelta(result.peaks[0].valueC, Ta + P * R * (1 - Math.exp(-3)), 1e-13, 'peak');
    expect(result.peaks[0].timeS).toBe(3 * tau);
  });
});
