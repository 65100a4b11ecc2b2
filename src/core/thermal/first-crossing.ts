import { checkIndex, checkNumber, checkVector } from './check-input';
import { ROOT_TIME_REL_TOL } from './constants';
import { isolateRoots } from './exp-sum-roots';
import { modalEquilibrium, modalFromTemperatures } from './modal-state';
import { evaluateSum, loadNodeResponse, signChanges } from './node-response';
import type { CrossingDirection, ModalModel } from './types';

/**
 * Earliest time τ in [0, h] (s, from the segment start) at which node nodeIndex reaches
 * levelC: T(τ) ≥ level for 'up', T(τ) ≤ level for 'down'. Returns 0 when the start state
 * already does, null when the node never does within the segment. The time returned is
 * within ROOT_TIME_REL_TOL·h of the exact crossing, on the side where the level is reached,
 * so advancing to it leaves the node at or past the level (up to round-off).
 */
export function firstCrossing(
  model: ModalModel,
  temperatures: ArrayLike<number>,
  u: ArrayLike<number>,
  h: number,
  nodeIndex: number,
  levelC: number,
  direction: CrossingDirection,
): number | null {
  checkVector(temperatures, 'temperatures', model.nodeCount);
  checkVector(u, 'u', model.inputCount);
  checkNumber(h, 'h', 0);
  checkIndex(nodeIndex, 'nodeIndex', model.nodeCount);
  checkNumber(levelC, 'levelC');
  if (direction !== 'up' && direction !== 'down') {
    throw new TypeError(`direction: expected "up" or "down", got ${String(direction)}`);
  }
  const { x, xInf, sum } = model.scratch;
  modalFromTemperatures(model, temperatures, x);
  modalEquilibrium(model, u, xInf);
  // g(τ) = ±(T(τ) − level): the level is reached where g first becomes ≥ 0.
  loadNodeResponse(model, sum, nodeIndex, x, xInf, u, levelC, direction === 'up' ? 1 : -1);
  if (evaluateSum(sum, 0) >= 0) return 0;
  if (h === 0) return null;
  // All coefficients of one sign: g keeps the sign of g(0) < 0 (Descartes' rule for
  // exponential sums, see exp-sum-roots.ts), so the level is never reached.
  if (signChanges(sum, 0) === 0) return null;
  const count = isolateRoots(sum, 0, h, 0);
  let t: number;
  if (count > 0) t = sum.roots[0];
  else if (evaluateSum(sum, h) >= 0) t = h;
  else return null;
  // Step onto the reached side of the root.
  let step = ROOT_TIME_REL_TOL * h;
  for (let i = 0; i < 60 && t < h && evaluateSum(sum, t) < 0; i++) {
    t = Math.min(h, t + step);
    step *= 2;
  }
  return t;
}
