import type { ModalModel } from '../thermal';
import type { ScanProfile } from './scan-profile';

/** Every node at the ambient ta: x = P T with T = ta everywhere. */
export function coldModes(model: ModalModel, ta: number, x: Float64Array): void {
  const { modeCount: n, nodeCount: N, modesFromTemperatures: P } = model;
  for (let k = 0; k < n; k++) {
    let v = 0;
    for (let i = 0; i < N; i++) v += P[k * N + i];
    x[k] = v * ta;
  }
}

/**
 * Modal start of the periodic steady state: over one period x(Tp) = e^(−λTp) x(0) + r, r being
 * the period's response from x = 0, so x(0) = r / (1 − e^(−λTp)) (PHYSICS.md §3).
 * decay holds e^(−λh) per distinct duration, equilibrium x∞ per distinct input row (see ScanProfile).
 */
export function periodicModes(model: ModalModel, profile: ScanProfile, decay: Float64Array, equilibrium: Float64Array, x: Float64Array): void {
  const { modeCount: n, rates } = model;
  const { durations, durationIndex, rowIndex } = profile;
  if (!(profile.totalTimeS > 0)) throw new RangeError('profile: a periodic profile needs a period longer than 0 s');
  x.fill(0);
  for (let s = 0; s < durations.length; s++) {
    if (durations[s] === 0) continue;
    const base = durationIndex[s] * n;
    const rn = rowIndex[s] * n;
    for (let k = 0; k < n; k++) x[k] = equilibrium[rn + k] + decay[base + k] * (x[k] - equilibrium[rn + k]);
  }
  for (let k = 0; k < n; k++) x[k] /= -Math.expm1(-rates[k] * profile.totalTimeS);
}
