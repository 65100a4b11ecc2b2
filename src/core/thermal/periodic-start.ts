import { checkNumber, checkVector } from './check-input';
import { advanceModes } from './advance';
import { modalEquilibrium, temperaturesFromModal } from './modal-state';
import type { ModalModel, Segment } from './types';

/**
 * Node temperatures (°C) at the start of a period in the periodic steady state reached when
 * `segments` ({ u, h }) repeat forever, in one period of work (PHYSICS.md §3): each mode
 * ends a period at x(Tp) = e^(−λTp) x(0) + r, r being the period's response from x = 0,
 * so x(0) = r / (1 − e^(−λTp)). Massless nodes take their values for the first segment.
 * Throws RangeError when the period has zero length.
 */
export function periodicStart(
  model: ModalModel,
  segments: readonly Segment[],
  out: Float64Array = new Float64Array(model.nodeCount),
): Float64Array {
  if (!Array.isArray(segments)) throw new TypeError('segments: expected an array of { u, h }');
  const q = model.inputCount;
  const durations = new Float64Array(segments.length);
  const inputs = new Float64Array(segments.length * q);
  segments.forEach((segment, s) => {
    durations[s] = checkNumber(segment?.h, `segments[${s}].h`, 0);
    checkVector(segment.u, `segments[${s}].u`, q);
    for (let j = 0; j < q; j++) inputs[s * q + j] = segment.u[j];
  });
  const x = periodicModes(model, durations, inputs, new Float64Array(model.modeCount), 'segments');
  return temperaturesFromModal(model, x, inputs.subarray(0, q), out);
}

/** Modal periodic start for flat, already checked arrays (see periodicStart). */
export function periodicModes(
  model: ModalModel,
  durations: ArrayLike<number>,
  inputs: ArrayLike<number>,
  x: Float64Array,
  path: string,
): Float64Array {
  const q = model.inputCount;
  const xInf = model.scratch.xInf;
  let period = 0;
  for (let s = 0; s < durations.length; s++) period += durations[s];
  if (!(period > 0)) throw new RangeError(`${path}: a periodic profile needs a period longer than 0 s`);
  x.fill(0);
  for (let s = 0; s < durations.length; s++) {
    const u = sliceOf(inputs, s * q, q);
    modalEquilibrium(model, u, xInf);
    advanceModes(model.rates, x, xInf, durations[s]);
  }
  for (let k = 0; k < model.modeCount; k++) x[k] /= -Math.expm1(-model.rates[k] * period);
  return x;
}

function sliceOf(values: ArrayLike<number>, start: number, length: number): ArrayLike<number> {
  if (values instanceof Float64Array) return values.subarray(start, start + length);
  return Array.prototype.slice.call(values, start, start + length) as number[];
}
