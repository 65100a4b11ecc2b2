import type { CrossingDirection, ModalModel } from './types';

/**
 * Earliest time in [0, h] at which node nodeIndex reaches levelC ('up': T ≥ level,
 * 'down': T ≤ level); 0 when the start already does; null when it never does in the segment.
 */
export function firstCrossing(model: ModalModel, temperatures: ArrayLike<number>, u: ArrayLike<number>, h: number, nodeIndex: number, levelC: number, direction: CrossingDirection): number | null {
  throw new Error('not implemented yet');
}
