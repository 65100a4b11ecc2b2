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
 * Modal start of the periodic steady state: the state at the end of a period equals the one at
 * its start, x(0) = x(Tp) = Σ_s (1 − e_s) x∞_s Π_(s' > s) e_s' / (1 − e^(−λTp)) per mode, with
 * e_s = e^(−λ h_s) (PHYSICS.md §3). Summed backwards from the end, a mode stops as soon as the
 * product of decays falls below e^(−decayedExponent): earlier segments no longer reach the end.
 * Fast modes so take one segment and only the slow ones run far back.
 * decay holds e^(−λh) per distinct duration, equilibrium x∞ per distinct input row (see ScanProfile).
 */
export function periodicModes(
  model: ModalModel,
  profile: ScanProfile,
  decay: Float64Array,
  equilibrium: Float64Array,
  x: Float64Array,
  decayedExponent: number,
): void {
  const { modeCount: n, rates } = model;
  const { durations, durationIndex, rowIndex } = profile;
  const T = profile.totalTimeS;
  if (!(T > 0)) throw new RangeError('profile: a periodic profile needs a period longer than 0 s');
  const floor = Math.exp(-decayedExponent);
  for (let k = 0; k < n; k++) {
    const lambda = rates[k];
    let product = 1;
    let sum = 0;
    let s = durations.length - 1;
    for (; s >= 0 && product > floor; s--) {
      const h = durations[s];
      if (h === 0) continue;
      const z = lambda * h;
      const e = decay[durationIndex[s] * n + k];
      // 1 − e loses digits for small λh; expm1 keeps them.
      const g = z < 0.1 ? -Math.expm1(-z) : 1 - e;
      sum += product * g * equilibrium[rowIndex[s] * n + k];
      product *= e;
    }
    x[k] = s < 0 ? sum / -Math.expm1(-lambda * T) : sum;
  }
}
