import type { ModalModel, Segment } from './types';

/**
 * Node temperatures at the start of a period in the periodic steady state of segments
 * repeated forever (one period of work). Throws RangeError for a zero-length period.
 */
export function periodicStart(model: ModalModel, segments: readonly Segment[], out?: Float64Array): Float64Array {
  throw new Error('not implemented yet');
}
