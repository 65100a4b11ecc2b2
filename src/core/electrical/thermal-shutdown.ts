/** Thermal shutdown with hysteresis: the output stops at Tj ≥ tripC, resumes at Tj ≤ tripC − hysteresisK. */
export type ThermalShutdownSpec = { tripC: number; hysteresisK: number };

/** The junction level and direction that would change the state next. */
export function shutdownWatch(spec: ThermalShutdownSpec, on: boolean): { levelC: number; direction: 'up' | 'down' } {
  return on ? { levelC: spec.tripC, direction: 'up' } : { levelC: spec.tripC - spec.hysteresisK, direction: 'down' };
}

/** The state after seeing junction temperature tjC: trips when on and at the trip point, resumes when off and at the resume point. */
export function nextShutdownState(spec: ThermalShutdownSpec, on: boolean, tjC: number): boolean {
  if (on) return tjC < spec.tripC;
  return tjC <= spec.tripC - spec.hysteresisK;
}
