import type { Distribution, InputKey } from './types';

/** Most Monte Carlo runs in one sweep. */
export const MAX_RUNS = 20_000;
/** Most inputs a corners sweep combines: 2^7 = 128 runs. */
export const MAX_CORNER_INPUTS = 7;
/** Most solved segments (runs × segments per run) in one sweep. */
export const MAX_TOTAL_SEGMENTS = 50_000_000;
/** Largest ± spread in percent: a resistance must stay positive in every run. */
export const MAX_SPREAD_PCT = 50;
/** Largest ambient shift, K. */
export const MAX_AMBIENT_SHIFT_K = 100;
/** z for a two-sided 95 % interval. */
export const Z_95 = 1.959963984540054;

/**
 * Datasheet and part spreads are normal with the ± as 3σ (a common practice reading of a
 * tolerance); the ambient, line and load ranges are where the site may sit, with no value
 * more likely than another: uniform.
 */
export const DEFAULT_DISTRIBUTIONS: Record<InputKey, Distribution> = {
  rthJc: 'normal',
  rthSa: 'normal',
  interface: 'normal',
  ambient: 'uniform',
  line: 'uniform',
  load: 'uniform',
  share: 'normal',
};

export const INPUT_LABELS: Record<InputKey, string> = {
  rthJc: 'Rθjc',
  rthSa: 'Rθsa',
  interface: 'Interface Rθcs',
  ambient: 'Ambient',
  line: 'Line voltage',
  load: 'Load current',
  share: 'Current share',
};
