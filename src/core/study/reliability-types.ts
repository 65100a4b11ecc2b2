import type { Mission, PowerCyclingModel, TouchContact, TouchMaterial } from '../reliability';

/**
 * Optional parts of a study (format version 1) about its site and its life: docs/study-format.md
 * `site`, `lifetime`, `touch`. A study without them solves exactly as before.
 */

/** Where the equipment runs: the air is thinner at altitude, so convection sheds less heat. */
export type StudySite = {
  /** Height above sea level, m (geometric; the standard atmosphere converts it). */
  altitudeM: number;
  /** Share of each sink's rated conductance carried by radiation, which altitude leaves alone (0–0.9). */
  radiationShare: number;
};

export type StudyArrhenius = { referenceC: number; activationEnergyEV: number };

/** Life from temperature cycles (PHYSICS.md §6). */
export type StudyLifetime = {
  powerCycling: PowerCyclingModel;
  mission: Mission;
  /** Cold starts a day of a periodic study: each adds one cycle from the ambient to the period's highest junction temperature. */
  startsPerDay: number;
  /** Time-weighted Arrhenius factor of each junction against referenceC. */
  arrhenius?: StudyArrhenius;
};

/** Touch limit of one sink: a number given, or one looked up by material and contact time. */
export type TouchRule = { accessible: boolean; limitC: number; material?: TouchMaterial; contact?: TouchContact };

/** Touch-temperature check: the rule resolved for every sink, by sink id. */
export type StudyTouch = { sinks: Record<string, TouchRule> };
