import { BOLTZMANN_EV_PER_K, KELVIN_OFFSET } from './constants';

/**
 * Arrhenius acceleration factor AF = exp[(Ea/kB)(1/Tuse − 1/Tstress)] (PHYSICS.md §6): how
 * much faster a thermally activated wear-out runs at Tstress than at Tuse. °C in, Ea in eV.
 */
export function accelerationFactor(useC: number, stressC: number, activationEnergyEV: number): number {
  const use = useC + KELVIN_OFFSET;
  const stress = stressC + KELVIN_OFFSET;
  if (!(use > 0) || !(stress > 0)) throw new RangeError(`temperatures must lie above absolute zero, got ${useC} °C and ${stressC} °C`);
  return Math.exp((activationEnergyEV / BOLTZMANN_EV_PER_K) * (1 / use - 1 / stress));
}

/**
 * Time-weighted Arrhenius factor of a junction history relative to a reference temperature:
 * (1/t) ∫ AF(Tref → Tj(t)) dt, with Tj taken linear between the points given (trapezoids of
 * AF). Points arrive in time order; a point at an earlier time than the last is refused.
 */
export type ArrheniusAverage = {
  add(timeS: number, valueC: number): void;
  /** Mean factor over the time covered (1 when no time has passed), and that time, s. */
  mean(): number;
  durationS(): number;
};

export function createArrheniusAverage(referenceC: number, activationEnergyEV: number): ArrheniusAverage {
  const ref = 1 / (referenceC + KELVIN_OFFSET);
  const scale = activationEnergyEV / BOLTZMANN_EV_PER_K;
  let lastT = NaN;
  let lastAf = NaN;
  let first = NaN;
  let integral = 0;
  const af = (c: number) => Math.exp(scale * (ref - 1 / (c + KELVIN_OFFSET)));
  return {
    add(timeS, valueC) {
      const value = af(valueC);
      if (Number.isNaN(lastT)) first = timeS;
      else if (timeS < lastT) throw new RangeError(`timeS: points must come in time order, got ${timeS} s after ${lastT} s`);
      else if (timeS > lastT) {
        // Between two points AF(T(t)) is convex in t, so the trapezoid errs slightly high.
        integral += 0.5 * (lastAf + value) * (timeS - lastT);
      }
      lastT = timeS;
      lastAf = value;
    },
    mean: () => (lastT > first ? integral / (lastT - first) : Number.isNaN(lastAf) ? 1 : lastAf),
    durationS: () => (lastT > first ? lastT - first : 0),
  };
}
