/** Tolerance and worst-case sweeps over datasheet, site and load spreads (corners and Monte Carlo). */
export * from './types';
export * from './constants';
export { activeInputs, describeDeviation } from './inputs';
export { perturbStudy, currentShares, type Deviations } from './perturb';
export { planTolerance, runDeviations, evaluateDeviations, evaluateNominal, evaluateRuns, type TolerancePlan, type RunBlock } from './plan';
export { summariseTolerance, type SweepRuns } from './summarise';
export { runTolerance } from './sweep';
export { quantile, percentiles, wilson, spearman, ranks, histogram } from './statistics';
export { mulberry32, runSeed, standardNormal } from './random';
