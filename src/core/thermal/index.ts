/** Thermal core: exact modal transients of lumped thermal networks, package models. */
export { AMBIENT } from './types';
export type {
  NodeSpec,
  LinkSpec,
  NetworkSpec,
  Segment,
  Peak,
  FosterTerm,
  CauerStage,
  ModalModel,
  Profile,
  RunOptions,
  RunResult,
  CrossingDirection,
} from './types';
export * from './constants';
export { validateNetwork, nodesWithoutAmbientPath } from './validate-network';
export { compileNetwork } from './compile-network';
export { modalFromTemperatures, temperaturesFromModal } from './modal-state';
export { steadyState } from './steady-state';
export { advance } from './advance';
export { peakInSegment } from './peak-in-segment';
export { firstCrossing } from './first-crossing';
export { periodicStart } from './periodic-start';
export { zth, zthTerms } from './zth';
export { runProfile } from './run-profile';
export { fosterZth } from './foster-zth';
export { fosterToCauer } from './foster-to-cauer';
export { cauerToFoster } from './cauer-to-foster';
export { cauerNetwork } from './cauer-network';
export { simulateTrapezoidal } from './trapezoidal';
export type { TrapezoidalOptions, TrapezoidalResult } from './trapezoidal';
