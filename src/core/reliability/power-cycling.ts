import type { RainflowCycles } from './rainflow';
import { BOLTZMANN_EV_PER_K, DAYS_PER_YEAR, KELVIN_OFFSET, LESIT_ACTIVATION_EV, LESIT_COEFFICIENT, LESIT_EXPONENT } from './constants';

/**
 * Coffin–Manson–Arrhenius power-cycling law `Nf = A · ΔTj^(−α) · exp(Ea/(kB·Tjm))`
 * (PHYSICS.md §6; LESIT, Held et al. 1997): ΔTj in K, Tjm the cycle's mean junction
 * temperature in K, Ea in eV.
 */
export type PowerCyclingModel = { coefficient: number; exponent: number; activationEnergyEV: number };

/** The LESIT fit (values from memory, see constants.ts). */
export const LESIT_MODEL: PowerCyclingModel = {
  coefficient: LESIT_COEFFICIENT,
  exponent: LESIT_EXPONENT,
  activationEnergyEV: LESIT_ACTIVATION_EV,
};

/** Cycles to failure of a cycle of range ΔTj (K) about a mean junction temperature (°C); Infinity for a zero range. */
export function cyclesToFailure(model: PowerCyclingModel, rangeK: number, meanC: number): number {
  if (!(rangeK >= 0)) throw new RangeError(`rangeK: must not be negative, got ${rangeK}`);
  const meanK = meanC + KELVIN_OFFSET;
  if (!(meanK > 0)) throw new RangeError(`meanC: must lie above absolute zero, got ${meanC} °C`);
  if (rangeK === 0) return Infinity;
  return model.coefficient * Math.pow(rangeK, -model.exponent) * Math.exp(model.activationEnergyEV / (BOLTZMANN_EV_PER_K * meanK));
}

/** Damage of each counted cycle class, count / Nf (Palmgren–Miner; Miner, J. Appl. Mech. 1945). */
export function cycleDamage(model: PowerCyclingModel, cycles: RainflowCycles): Float64Array {
  const out = new Float64Array(cycles.length);
  for (let k = 0; k < cycles.length; k++) out[k] = cycles.count[k] / cyclesToFailure(model, cycles.range[k], cycles.mean[k]);
  return out;
}

/** Palmgren–Miner damage sum D = Σ n_i / Nf,i; failure is expected at D = 1. */
export function minerDamage(model: PowerCyclingModel, cycles: RainflowCycles): number {
  let total = 0;
  for (const d of cycleDamage(model, cycles)) total += d;
  return total;
}

/** How often a day holds the counted history: hours of it per day, or whole repeats per day. */
export type Mission = { kind: 'hours'; hoursPerDay: number } | { kind: 'repeats'; repeatsPerDay: number };

/** Repeats of a history lasting durationS (s) in one day of the mission. */
export function repeatsPerDay(mission: Mission, durationS: number): number {
  if (mission.kind === 'repeats') return mission.repeatsPerDay;
  if (!(durationS > 0)) throw new RangeError(`durationS: must be greater than zero, got ${durationS}`);
  return (mission.hoursPerDay * 3600) / durationS;
}

export type LifeEstimate = {
  /** Damage of one repeat of the history and of one day. */
  damagePerRepeat: number;
  damagePerDay: number;
  /** Repeats of the history until D = 1 (Infinity without damage). */
  repeatsToFailure: number;
  /** Years until D = 1 (Infinity without damage). */
  years: number;
};

/** Life under a mission from the damage of one repeat of the history. */
export function lifeFromDamage(damagePerRepeat: number, perDay: number): LifeEstimate {
  const damagePerDay = damagePerRepeat * perDay;
  return {
    damagePerRepeat,
    damagePerDay,
    repeatsToFailure: damagePerRepeat > 0 ? 1 / damagePerRepeat : Infinity,
    years: damagePerDay > 0 ? 1 / (damagePerDay * DAYS_PER_YEAR) : Infinity,
  };
}
