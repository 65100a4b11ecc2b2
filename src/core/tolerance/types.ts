/**
 * Tolerance and worst-case sweeps: the spreads a datasheet and a site really have, applied to
 * a parsed study, each run solved by the study pipeline for its junction peaks.
 * Percentages are ± of the nominal value; the ambient range is a shift in K of the study's
 * ambient (every point of an ambient profile moves by it).
 */

export type ToleranceMode = 'corners' | 'monte-carlo';
export const TOLERANCE_MODES: readonly ToleranceMode[] = ['corners', 'monte-carlo'];

export type Distribution = 'uniform' | 'normal';
export const DISTRIBUTIONS: readonly Distribution[] = ['uniform', 'normal'];

/** The inputs a sweep can spread, in the order they are listed. */
export type InputKey = 'rthJc' | 'rthSa' | 'interface' | 'ambient' | 'line' | 'load' | 'share';
export const INPUT_KEYS: readonly InputKey[] = ['rthJc', 'rthSa', 'interface', 'ambient', 'line', 'load', 'share'];

export type ToleranceSpec = {
  mode: ToleranceMode;
  /** ± % of every package's Rθjc (each R of a Foster or Cauer model; Foster τ kept). */
  rthJcPct: number;
  /** ± % of every sink's Rθsa (its forced-air curve too). */
  rthSaPct: number;
  /** ± % of every interface resistance. */
  interfacePct: number;
  /** Shift of the ambient, K, from low to high (low ≤ 0 ≤ high is usual, not required). */
  ambientLowK: number;
  ambientHighK: number;
  /** ± % of the line: vinV of electrical segments and every rail-plan source's open-circuit voltage. */
  linePct: number;
  /** ± % of the load: iloadA of electrical segments and the given powerW of power segments. */
  loadPct: number;
  /** ± % part-to-part current share error between pass devices in parallel. */
  sharePct: number;
  /** Monte Carlo runs. */
  runs: number;
  /** Seed of the random generator (Monte Carlo): the same seed gives the same runs. */
  seed: number;
  /** Per-input distribution (Monte Carlo); defaults in DEFAULT_DISTRIBUTIONS. */
  distributions?: Partial<Record<InputKey, Distribution>>;
};

/** One input the sweep varies: its key, label, and the range of its deviation. */
export type ActiveInput = {
  key: InputKey;
  label: string;
  /** Deviation at the low and high extreme: a fraction (0.1 = +10 %) or, for the ambient, K. */
  low: number;
  high: number;
  unit: '%' | 'K';
  distribution: Distribution;
};

/** An input the spec spreads but the study gives nothing to act on, and why. */
export type SkippedInput = { key: InputKey; label: string; reason: string };

export type Percentiles = { p1: number; p5: number; p50: number; p95: number; p99: number };

export type DeviceSpread = {
  id: string;
  tjMaxC: number;
  targetC: number;
  nominalC: number;
  minC: number;
  maxC: number;
  meanC: number;
  sdK: number;
  percentiles: Percentiles;
  exceedTarget: Probability;
  exceedMax: Probability;
};

/** An estimated probability k/n with its 95 % Wilson score interval. */
export type Probability = { count: number; runs: number; p: number; low: number; high: number };

export type Sensitivity = {
  key: InputKey;
  label: string;
  /** Monte Carlo: Spearman's ρ between the input and the peak; corners: the main effect in K. */
  value: number;
  /** |value| relative to the largest |value| (0…1), for the bar list. */
  relative: number;
};

export type Histogram = { edgesC: number[]; counts: number[] };

export type ToleranceResult = {
  mode: ToleranceMode;
  runs: number;
  seed?: number;
  inputs: ActiveInput[];
  skipped: SkippedInput[];
  /** The device whose peak the histogram shows: the one with the least margin in the nominal run. */
  focus: string;
  devices: DeviceSpread[];
  /** Any device over its target / its Tj,max in a run. */
  anyExceedTarget: Probability;
  anyExceedMax: Probability;
  histogram: Histogram;
  /** Corners: the combination of extremes with the least margin, in words and values. */
  worstCorner?: { index: number; peakC: number; device: string; marginToTargetK: number; deviations: number[]; words: string };
  sensitivity: { method: 'spearman' | 'main-effect'; ranking: Sensitivity[] };
  notes: string[];
};

/** What one run gives: each device's peak junction temperature, °C, in device order. */
export type RunPeaks = Float64Array;
