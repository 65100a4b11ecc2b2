import { compileNetwork, runProfile, simulateTrapezoidal } from '@/core/thermal';
import type { NetworkSpec } from '@/core/thermal';

// Junction, case (massless), sink: one device, an invented three-segment profile.
const spec: NetworkSpec = {
  nodes: [
    { id: 'junction', capacityJPerK: 0.8 },
    { id: 'case', capacityJPerK: 0 },
    { id: 'sink', capacityJPerK: 30 },
  ],
  links: [
    { a: 'junction', b: 'case', rKPerW: 0.6 },
    { a: 'case', b: 'sink', rKPerW: 0.3 },
    { a: 'sink', b: 'ambient', rKPerW: 1.4 },
  ],
  heatInputs: ['junction'],
};
const profile = { durations: [2, 5, 3], inputs: [25, 30, 5, 30, 15, 35] };

function boundaryError(dtS: number): number {
  const exact = runProfile(compileNetwork(spec), profile, { recordBoundaries: true }).boundaries as Float64Array;
  const trap = simulateTrapezoidal(spec, profile, { dtS, recordBoundaries: true }).boundaries as Float64Array;
  let worst = 0;
  for (let i = 0; i < exact.length; i++) worst = Math.max(worst, Math.abs(trap[i] - exact[i]));
  return worst;
}

describe('simulateTrapezoidal', () => {
  it('converges at second order to the modal solution (halving dt divides the error by ~4)', () => {
    // Crank–Nicolson is second-order accurate (textbook numerical analysis).
    const errors = [0.2, 0.1, 0.05, 0.025].map(boundaryError);
    for (let i = 1; i < errors.length; i++) {
      const ratio = errors[i - 1] / errors[i];
      expect(ratio).toBeGreaterThan(3.6);
      expect(ratio).toBeLessThan(4.4);
    }
    expect(errors[3]).toBeLessThan(1e-3);
  });

  it.each([
    ['junction', 0],
    ['massless case', 1],
  ])('sampled %s peak approaches the exact peak as the step shrinks', (_, node) => {
    const exact = runProfile(compileNetwork(spec), profile, { watchNodes: [node] }).peaks[0];
    const coarse = simulateTrapezoidal(spec, profile, { dtS: 0.1, watchNodes: [node] }).peaks[0];
    const fine = simulateTrapezoidal(spec, profile, { dtS: 0.005, watchNodes: [node] }).peaks[0];
    expect(Math.abs(fine.valueC - exact.valueC)).toBeLessThan(Math.abs(coarse.valueC - exact.valueC));
    expect(Math.abs(fine.valueC - exact.valueC)).toBeLessThan(1e-4);
    expect(Math.abs(fine.timeS - exact.timeS)).toBeLessThan(0.01);
  });

  it('rejects a non-positive step with the option name', () => {
    expect(() => simulateTrapezoidal(spec, profile, { dtS: 0 })).toThrow(/options\.dtS/);
  });
});
