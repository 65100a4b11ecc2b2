import { checkIndex, checkNumber, checkVector } from './check-input';
import { modalEquilibrium, modalFromTemperatures } from './modal-state';
import { loadNodeResponse, maximumOfSum } from './node-response';
import type { ModalModel, Peak } from './types';

const result = new Float64Array(2);

/**
 * Exact maximum (°C) of node nodeIndex over [0, h] of a segment with constant inputs u,
 * starting from node temperatures (°C), interior maxima included; timeS is from the segment
 * start (earliest on a tie). Endpoints suffice when every modal coefficient has one sign;
 * otherwise the derivative's sign changes are isolated and refined (ROOT_TIME_REL_TOL).
 * Massless nodes take their value for u from τ = 0.
 */
export function peakInSegment(
  model: ModalModel,
  temperatures: ArrayLike<number>,
  u: ArrayLike<number>,
  h: number,
  nodeIndex: number,
): Peak {
  checkVector(temperatures, 'temperatures', model.nodeCount);
  checkVector(u, 'u', model.inputCount);
  checkNumber(h, 'h', 0);
  checkIndex(nodeIndex, 'nodeIndex', model.nodeCount);
  if (h === 0 && model.massless[nodeIndex] === 0) return { valueC: temperatures[nodeIndex], timeS: 0 };
  const { x, xInf, sum } = model.scratch;
  modalFromTemperatures(model, temperatures, x);
  modalEquilibrium(model, u, xInf);
  loadNodeResponse(model, sum, nodeIndex, x, xInf, u, 0, 1);
  maximumOfSum(sum, h, result);
  return { valueC: result[0], timeS: result[1] };
}
