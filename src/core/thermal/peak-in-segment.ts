import type { ModalModel, Peak } from './types';

/**
 * Exact maximum of node nodeIndex over [0, h] of a constant-input segment starting from
 * temperatures, interior maxima included; timeS is relative to the segment start.
 */
export function peakInSegment(model: ModalModel, temperatures: ArrayLike<number>, u: ArrayLike<number>, h: number, nodeIndex: number): Peak {
  throw new Error('not implemented yet');
}
