/** Rail plans: sources switched into taps, tap selection with hysteresis, dissipation maps, worst cases. */
export type {
  RailSource,
  PathParts,
  TapCircuit,
  Tap,
  SensedVoltage,
  TapThresholds,
  RailPlan,
  PassElement,
  OutputRange,
  Characteristic,
  TapCapability,
  CompiledTap,
  RailModel,
} from './types';
export * from './constants';
export { compileRailPlan } from './compile-plan';
export { tapVoltage, tapCapability } from './tap-electrical';
export { nextTap, selectTaps, tapWithoutHistory } from './tap-selection';
export type { TapChange } from './tap-selection';
export { CELL_STATUS, CELL_OK, CELL_DROPOUT, CELL_CURRENT_LIMIT, CELL_OVER_CAPACITY, CELL_NOT_SERVED, evaluateCell, serviceRange } from './cell';
export type { CellStatus, Cell } from './cell';
export { dissipationMap } from './dissipation-map';
export type { DissipationMap, MapLayer } from './dissipation-map';
export { tapWorstCases, bestThresholds, highestCurrent } from './worst-case';
export type { TapWorstCase, WorstCases, BestThreshold } from './worst-case';
export { checkChatter } from './chatter';
export type { Relay, ChatterCheck } from './chatter';
export { requiredSinkRth } from './required-sink';
export type { SinkSizing } from './required-sink';
export { adjustableOutputV, adjustableTopOfRange } from './adjustable-output';
export type { AdjustableDivider, AdjustableTop } from './adjustable-output';
export { railPlanReport } from './rail-plan-report';
export type { RailPlanOptions, RailPlanReport } from './rail-plan-report';
