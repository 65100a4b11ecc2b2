/** Reliability: rainflow counting, power-cycling life, Arrhenius factors, site altitude, touch limits. */
export * from './constants';
export { createTurningPoints, turningPoints } from './turning-points';
export type { TurningPoints } from './turning-points';
export { rainflow, rainflowPeriodic, pairHalfCycles } from './rainflow';
export type { RainflowCycles } from './rainflow';
export { LESIT_MODEL, cyclesToFailure, cycleDamage, minerDamage, repeatsPerDay, lifeFromDamage } from './power-cycling';
export type { PowerCyclingModel, Mission, LifeEstimate } from './power-cycling';
export { accelerationFactor, createArrheniusAverage } from './arrhenius';
export type { ArrheniusAverage } from './arrhenius';
export { standardAtmosphere, ISA_PRESSURE_EXPONENT } from './atmosphere';
export type { AtmosphereState } from './atmosphere';
export { convectionRatio, rsaAltitudeFactor, FORCED_LAMINAR_RE_EXPONENT } from './altitude-derating';
export type { ConvectionLaw } from './altitude-derating';
export { TOUCH_MATERIALS, TOUCH_CONTACTS, TOUCH_LIMITS_C, touchLimitC, checkTouch } from './touch';
export type { TouchMaterial, TouchContact, TouchVerdict } from './touch';
