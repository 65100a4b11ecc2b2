import type { ModalModel, Profile, RunOptions, RunResult } from './types';

/**
 * Runs a long piecewise-constant profile in modal coordinates: exact peaks of the watched
 * nodes (interior ones included), optionally every boundary state. Memory does not grow
 * with the number of segments unless recordBoundaries is set.
 */
export function runProfile(model: ModalModel, profile: Profile, options: RunOptions = {}): RunResult {
  throw new Error('not implemented yet');
}
