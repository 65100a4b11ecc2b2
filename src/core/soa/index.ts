/** Safe operating area of pass transistors: limits, boundary curves, checks of a solved profile. */
export type {
  TransistorKind,
  SoaLimit,
  PulseWidth,
  ZthJc,
  Derating,
  SecondBreakdown,
  LinearModeRating,
  SoaParameters,
  SoaPoint,
  SoaCurve,
  SoaPoints,
  SoaModel,
  SoaCondition,
  AllowedCurrent,
  SoaOperatingPoint,
  SoaWarning,
  SoaWorstPoint,
  SoaCheck,
  SoaBoundarySegment,
  SoaBoundary,
} from './types';
export * from './constants';
export { checkSoaModel } from './check-model';
export { allowedCurrent } from './allowed-current';
export { soaBoundary } from './boundary';
export type { BoundaryOptions } from './boundary';
export { checkOperatingPoints, operatingPointFromDrive } from './check-points';
export { pulseFor } from './pulse-for';
export { needsLinearModeWarning } from './linear-mode';
export { deratingFactor, thermalDeratingFactor } from './derating';
