import type { NetworkSpec, Profile, RunOptions, RunResult } from './types';

export type TrapezoidalOptions = Omit<RunOptions, 'periodic'> & {
  /** Largest step, s; each segment takes ceil(h / dtS) equal steps. */
  dtS: number;
};

/**
 * Trapezoidal (Crank–Nicolson) integration of the same network, for cross-checks only:
 * second-order accurate, peaks sampled at the steps.
 */
export function simulateTrapezoidal(spec: NetworkSpec, profile: Profile, options: TrapezoidalOptions): RunResult {
  throw new Error('not implemented yet');
}
