import type { Mission, PowerCyclingModel, TouchContact, TouchMaterial } from '../reliability';

/** Site altitude and what it did to each sink's Rθsa (docs/study-format.md `site`). */
export type SiteResult = {
  altitudeM: number;
  /** p/p0 of the standard atmosphere: the air density ratio at the study's own ambient. */
  pressureRatio: number;
  /** ρ/ρ0 of the standard day at that altitude (colder air aloft), for reference. */
  standardDensityRatio: number;
  radiationShare: number;
  sinks: Record<string, { law: 'natural' | 'forced'; exponent: number; factor: number; givenRthKPerW: number; usedRthKPerW: number }>;
  /** The enclosure's Rθ to the room, derated as laminar natural convection. */
  enclosure?: { factor: number; givenRthKPerW: number; usedRthKPerW: number };
};

/** A class of counted junction cycles (range rounded to 0.1 K, mean to 1 °C). */
export type CycleClass = {
  rangeK: number;
  meanC: number;
  /** Cycles of this class in one repeat of the counted history. */
  count: number;
  cyclesToFailure: number;
  /** Share of the device's damage, 0–1. */
  damageShare: number;
};

/** Counted cycles by range: bar k spans [edgesK[k], edgesK[k + 1]). */
export type CycleHistogram = { edgesK: number[]; counts: number[]; damageShare: number[] };

export type DeviceLifetime = {
  device: string;
  /** Cycles counted in one repeat (ranges of MIN_REPORTED_RANGE_K and more). */
  cycles: number;
  largestRangeK: number;
  histogram: CycleHistogram;
  /** The most damaging classes, most damaging first (at most MAX_LISTED_CYCLES). */
  dominant: CycleClass[];
  damagePerRepeat: number;
  /** With startsPerDay: the cycle of each cold start (ambient to the period's peak) and its damage a day. */
  startCycle?: { rangeK: number; meanC: number; cyclesToFailure: number; damagePerDay: number };
  /** Cycles and cold starts together. */
  damagePerDay: number;
  /** null when the history holds no damaging cycle. */
  repeatsToFailure: number | null;
  lifeYears: number | null;
  /** Time-weighted Arrhenius factor against the reference, and the equivalent hours at it per day. */
  arrhenius?: { referenceC: number; activationEnergyEV: number; meanFactor: number; equivalentHoursPerDay: number };
  /** The history held more turning points than are counted; the counted part is the start. */
  truncated: boolean;
};

export type LifetimeResult = {
  model: PowerCyclingModel;
  mission: Mission;
  /** Periodic: one period in its steady state, closed (full cycles). Otherwise the whole run, open ends as half cycles. */
  counted: 'period' | 'run';
  countedS: number;
  repeatsPerDay: number;
  /** Operating hours a day (repeats × counted time). */
  hoursPerDay: number;
  devices: Record<string, DeviceLifetime>;
  /** The device with the shortest life, when one has any damage. */
  shortest?: { device: string; lifeYears: number };
};

export type SinkTouchResult = {
  sink: string;
  accessible: boolean;
  peakC: number;
  limitC: number;
  material?: TouchMaterial;
  contact?: TouchContact;
  marginK: number;
  /** Accessible sinks only; an inaccessible one always passes. */
  passed: boolean;
  /** Above BURN_CAUTION_C (common practice), accessible or not. */
  burnCaution: boolean;
};

export type TouchResult = { passed: boolean; burnCautionC: number; sinks: Record<string, SinkTouchResult> };
