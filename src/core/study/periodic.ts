import { modalFromTemperatures, temperaturesFromModal, type ModalModel } from '../thermal';

/**
 * One step towards the periodic steady state. Over a period Tp each mode obeys
 * x_end = μ x0 + f with μ = e^(−λ Tp) and f the forced response, so the periodic start is
 * x* = f / (1 − μ) = (x_end − μ x0) / (1 − μ) (PHYSICS.md §3). Exact in one step for a linear
 * network; with events or a non-linear sink it is a Newton-like step on the model given.
 * Massless nodes follow from the inputs at the period start, u0.
 */
export function periodicCorrection(model: ModalModel, T0: ArrayLike<number>, Tend: ArrayLike<number>, u0: ArrayLike<number>, periodS: number): Float64Array {
  const x0 = modalFromTemperatures(model, T0);
  const xEnd = modalFromTemperatures(model, Tend);
  const x = new Float64Array(model.modeCount);
  for (let i = 0; i < model.modeCount; i++) {
    const lt = model.rates[i] * periodS;
    const mu = Math.exp(-lt);
    x[i] = (xEnd[i] - mu * x0[i]) / -Math.expm1(-lt);
  }
  return temperaturesFromModal(model, x, u0);
}

/** Largest |a − b| over the given entries, K. */
export function maxDifference(a: ArrayLike<number>, b: ArrayLike<number>, entries: readonly number[]): number {
  let worst = 0;
  for (const i of entries) worst = Math.max(worst, Math.abs(a[i] - b[i]));
  return worst;
}
