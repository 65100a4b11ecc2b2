import { checkIndex, checkNumber } from './check-input';
import type { FosterTerm, ModalModel } from './types';

/**
 * Thermal impedance Zth(t), K/W: rise of node nodeIndex above ambient t seconds after a
 * unit step of power input inputIndex, from equilibrium. Zth(∞) is the steady transfer
 * resistance; Zth(0) is non-zero only for massless nodes fed without capacity in between.
 */
export function zth(model: ModalModel, inputIndex: number, nodeIndex: number, t: number): number {
  checkIndex(inputIndex, 'inputIndex', model.powerInputCount);
  checkIndex(nodeIndex, 'nodeIndex', model.nodeCount);
  checkNumber(t, 't', 0);
  const { modeCount: n, inputCount: q, rates, outputFromModes: W, modesFromInputs: F } = model;
  // Summed as D + Σ r_k (1 − e^(−λ_k t)) with expm1, so short times keep full precision.
  let v = model.outputFromInputs[nodeIndex * q + inputIndex];
  for (let k = 0; k < n; k++) v -= W[nodeIndex * n + k] * F[k * q + inputIndex] * Math.expm1(-rates[k] * t);
  return v;
}

/**
 * The same response as a Foster-like sum, ascending τ:
 * Zth(t) = instantKPerW + Σ rKPerW (1 − e^(−t/tauS)). For a transfer (not driving-point)
 * response some rKPerW may be negative.
 */
export function zthTerms(
  model: ModalModel,
  inputIndex: number,
  nodeIndex: number,
): { instantKPerW: number; terms: FosterTerm[] } {
  checkIndex(inputIndex, 'inputIndex', model.powerInputCount);
  checkIndex(nodeIndex, 'nodeIndex', model.nodeCount);
  const { modeCount: n, inputCount: q, rates, outputFromModes: W, modesFromInputs: F } = model;
  const terms: FosterTerm[] = [];
  for (let k = n - 1; k >= 0; k--) terms.push({ rKPerW: W[nodeIndex * n + k] * F[k * q + inputIndex], tauS: 1 / rates[k] });
  return { instantKPerW: model.outputFromInputs[nodeIndex * q + inputIndex], terms };
}
