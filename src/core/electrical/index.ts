/** Electrical side of a pass element: dissipation, dropout, current limit, thermal shutdown. */
export type { CurvePoint } from './interpolate-linear';
export { interpolateLinear } from './interpolate-linear';
export { passDissipationW } from './dissipation';
export type { PassMember, Drive, OperatingPoint } from './operating-point';
export { solveOperatingPoint } from './operating-point';
export type { ThermalShutdownSpec } from './thermal-shutdown';
export { shutdownWatch, nextShutdownState } from './thermal-shutdown';
