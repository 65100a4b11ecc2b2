import { checkCandidates, type CheckedCandidate, type SinkCandidate } from './candidate';
import { candidateRsaMode } from './candidate-rsa';
import { checkFinite, checkNonNegative, checkObject } from './check';
import { CONVECTION_REL_TOL, PEAK_TOLERANCE_K } from './constants';
import { prepareRanking, type PreparedRanking, type RankingSetup } from './ranking-setup';
import { scanProfile } from './scan-profile';
import { derateCandidate, siteDerating, type RankingSite, type SiteDerating } from './site-derating';
import { createScanWorkspace } from './scan-workspace';
import { simulateCandidate } from './simulate-candidate';
import { steadyMargin, steadyRequirement, type SteadyRequirement } from './steady-answer';

export type SortKey = 'mass' | 'volume' | 'price';
export const SORT_KEYS: readonly SortKey[] = ['mass', 'volume', 'price'];

/**
 * A what-if: still air (0) or an air speed, m/s; the ambient and the margin instead of the
 * setup's. site: every candidate's Rθsa derated for that altitude (none: sea level).
 */
export type RankingOptions = { airSpeedMPerS?: number; ambientC?: number; marginK?: number; sortBy?: SortKey; site?: RankingSite };

export type DevicePeak = { id: string; peakC: number; peakTimeS: number; targetC: number; marginK: number };

export type CandidateResult = {
  id: string;
  name?: string;
  status: 'pass' | 'fail' | 'excluded';
  /** Why an excluded candidate was not simulated. */
  reason?: string;
  /** Rθsa the profile was simulated with, K/W, and where it came from. */
  rsaKPerW?: number;
  rsaSource?: 'natural' | 'forced';
  /** In still air: the rise exponent n of its natural-convection law, and whether the catalogue gave it (else the laminar 1/4). */
  convectionExponent?: { n: number; given: boolean };
  /** With a site: the factor its catalogue Rθsa was multiplied by (already in rsaKPerW). */
  siteFactor?: number;
  /** Time-averaged sink rise over the profile, K. */
  meanRiseK?: number;
  runs?: number;
  devices: DevicePeak[];
  /** Smallest device margin, K (NaN when excluded). */
  worstMarginK: number;
  /** The steady answer for this sink: every segment's powers held forever. */
  steady?: { marginK: number; passes: boolean; rsaKPerW: number };
  capacityJPerK: number;
  massKg?: number;
  volumeM3?: number;
  price?: number;
  /** The value sorted on (null when the candidate lacks it: sorted last). */
  sortValue: number | null;
  notes: string[];
};

export type RankingResult = {
  scenario: { airSpeedMPerS: number; ambientC: number; marginK: number; sortBy: SortKey };
  /** With a site: the altitude every candidate was ranked at and its factor on Rθsa. */
  site?: SiteDerating;
  /** With an enclosure: the air the sink leads to, its Rθ to the room and heat capacity. */
  enclosure?: { rthKPerW: number; capacityJPerK: number };
  /** Required Rθsa for the steady worst case. */
  required: SteadyRequirement;
  /** Passing (by sortBy), then failing (closest first), then excluded. */
  ranked: CandidateResult[];
  passing: CandidateResult[];
  failing: CandidateResult[];
  excluded: CandidateResult[];
  /** The smallest passing sink by sortBy. */
  smallest: CandidateResult | null;
  /** The smallest sink the steady answer alone accepts. */
  steadyChoice: CandidateResult | null;
  /** How much smaller (by sortBy) the profile's thermal mass lets the choice be. */
  thermalMassGain: { key: SortKey; smallest: number; steady: number; fraction: number } | null;
  /** Set when nothing passes, saying why. */
  message?: string;
  assumptions: string[];
  stats: { candidates: number; profileRuns: number; interiorSearches: number };
};

const ASSUMPTIONS_BEFORE = [
  'Every candidate is simulated on the whole profile with its heat capacity (exact piecewise-constant modal solution).',
  `Peaks lie within ${PEAK_TOLERANCE_K} K below the exact modal solution.`,
  'A natural-convection rating Rsa,ref (ΔTref/ΔT)^n is applied to the whole catalogue value, radiation included.',
];
const ASSUMPTIONS_AFTER = [
  'Forced-air Rθsa is interpolated in log–log between catalogue points and held at the ends (flagged).',
  'A sink without a forced-air curve keeps its still-air Rθsa in moving air (conservative).',
];
const TO_AMBIENT = [
  `A natural-convection sink is linearised at its time-averaged rise over the profile (fixed point to ${CONVECTION_REL_TOL * 100} % on Rθsa).`,
  ...ASSUMPTIONS_AFTER,
  'The sink leads straight to a constant ambient; identical parts on it share their power equally.',
  'The steady answer holds every segment’s powers forever; thermal mass can only lower the peak below it.',
];
const ASSUMPTIONS = [...ASSUMPTIONS_BEFORE, ...TO_AMBIENT];

function enclosureAssumptions(e: { rthKPerW: number; capacityJPerK: number }): string[] {
  const rth = Number(e.rthKPerW.toPrecision(4));
  return [
    ...ASSUMPTIONS_BEFORE,
    `A natural-convection sink is linearised at its time-averaged rise above the enclosure air over the profile (fixed point to ${CONVECTION_REL_TOL * 100} % on Rθsa).`,
    ...ASSUMPTIONS_AFTER,
    `The sink leads to the enclosure air, one node of ${Number(e.capacityJPerK.toPrecision(4))} J/K with ${rth} K/W to a constant ambient; ` +
      'no other sink heats that air; identical parts on the sink share their power equally.',
    `The steady answer holds every segment’s powers forever, the enclosure air then at Ta + P_total × ${rth} K/W; thermal mass can only lower the peak below it.`,
  ];
}

/** Ranks candidate sinks for a setup (see rankPrepared). */
export function rankSinks(setup: RankingSetup, candidates: SinkCandidate[], options: RankingOptions = {}): RankingResult {
  return rankPrepared(prepareRanking(setup), candidates, options);
}

/** One ranking per what-if, sharing the prepared setup. */
export function rankScenarios(prep: PreparedRanking, candidates: SinkCandidate[], scenarios: RankingOptions[]): RankingResult[] {
  const checked = checkCandidates(candidates);
  return scenarios.map((options) => rankChecked(prep, checked, options));
}

/**
 * Simulates every candidate on the profile and ranks them (PHYSICS.md §5): peak Tj per
 * device, margin to Tj,max − margin, pass or fail; passing ones sorted by mass, volume or
 * price; the smallest passing one; the steady answer (required Rθsa and the smallest sink
 * that meets it) and how much smaller a sink the profile's thermal mass allows.
 */
export function rankPrepared(prep: PreparedRanking, candidates: SinkCandidate[], options: RankingOptions = {}): RankingResult {
  return rankChecked(prep, checkCandidates(candidates), options);
}

function rankChecked(prep: PreparedRanking, candidates: CheckedCandidate[], options: RankingOptions): RankingResult {
  const opts = checkObject(options, 'options');
  const airSpeed = opts.airSpeedMPerS === undefined ? 0 : checkNonNegative(opts.airSpeedMPerS, 'options.airSpeedMPerS');
  const ambientC = opts.ambientC === undefined ? prep.ambientC : checkFinite(opts.ambientC, 'options.ambientC');
  const marginK = opts.marginK === undefined ? prep.marginK : checkNonNegative(opts.marginK, 'options.marginK');
  const sortBy = (opts.sortBy ?? 'mass') as SortKey;
  if (!SORT_KEYS.includes(sortBy)) throw new RangeError(`options.sortBy: must be one of ${SORT_KEYS.join(', ')}, got ${JSON.stringify(opts.sortBy)}`);
  const site = opts.site === undefined ? undefined : siteDerating(opts.site as RankingSite);

  const m = prep.devices.length;
  const S = prep.durations.length;
  const q = m + 1;
  const inputs = new Float64Array(S * q);
  for (let s = 0; s < S; s++) {
    for (let i = 0; i < m; i++) inputs[s * q + i] = prep.entryPowerW[s * m + i];
    inputs[s * q + m] = ambientC;
  }
  const scan = scanProfile(prep.durations, inputs, q);
  const ws = createScanWorkspace();
  const parts = prep.devices.reduce((sum, d) => sum + d.count, 0);
  const required = steadyRequirement(prep, ambientC, marginK);
  let profileRuns = 0;
  let interiorSearches = 0;

  const results = candidates.map((given): CandidateResult => {
    const derated = site ? derateCandidate(given, site) : undefined;
    const c = derated ? derated.candidate : given;
    const base: CandidateResult = {
      id: c.id,
      status: 'excluded',
      devices: [],
      worstMarginK: NaN,
      capacityJPerK: c.capacityJPerK,
      sortValue: sortValue(c, sortBy),
      notes: [],
    };
    if (c.name !== undefined) base.name = c.name;
    if (c.massKg !== undefined) base.massKg = c.massKg;
    if (c.volumeM3 !== undefined) base.volumeM3 = c.volumeM3;
    if (c.price !== undefined) base.price = c.price;
    if (c.capacitySource === 'none') base.notes.push('no heat capacity given: simulated without thermal mass');
    if (c.devicesPerSink !== undefined && c.devicesPerSink < parts) {
      return { ...base, reason: `carries ${c.devicesPerSink} part${c.devicesPerSink === 1 ? '' : 's'}, the setup has ${parts}` };
    }
    const mode = candidateRsaMode(c, airSpeed);
    if (mode.mode === 'none') return { ...base, reason: mode.reason };
    if (mode.note) base.notes.push(mode.note);
    if (mode.mode === 'natural' && c.natural) base.convectionExponent = { n: c.natural.exponent, given: c.exponentGiven === true };
    if (derated) base.siteFactor = mode.mode === 'natural' ? derated.naturalFactor : derated.forcedFactor;
    let sim;
    try {
      sim = simulateCandidate(prep, scan, c, mode, ws);
    } catch (err) {
      if (err instanceof RangeError) return { ...base, reason: `could not be simulated: ${err.message}` };
      throw err;
    }
    profileRuns += sim.runs;
    interiorSearches += sim.interiorSearches;
    if (!sim.settled) base.notes.push(`Rθsa still moved more than ${CONVECTION_REL_TOL * 100} % after ${sim.runs} runs`);
    const devices = prep.devices.map((d, i): DevicePeak => {
      const targetC = d.tjMaxC - marginK;
      return { id: d.id, peakC: sim.peakC[i], peakTimeS: sim.peakTimeS[i], targetC, marginK: targetC - sim.peakC[i] };
    });
    const worst = Math.min(...devices.map((d) => d.marginK));
    const steady = steadyMargin(prep, c, mode, ambientC, marginK);
    return {
      ...base,
      status: worst >= 0 ? 'pass' : 'fail',
      rsaKPerW: sim.rsaKPerW,
      rsaSource: mode.mode,
      meanRiseK: sim.meanRiseK,
      runs: sim.runs,
      devices,
      worstMarginK: worst,
      steady: { marginK: steady.marginK, passes: steady.marginK >= 0, rsaKPerW: steady.rsaKPerW },
    };
  });

  const byKey = (a: CandidateResult, b: CandidateResult) =>
    (a.sortValue ?? Infinity) - (b.sortValue ?? Infinity) || b.worstMarginK - a.worstMarginK || a.id.localeCompare(b.id);
  const passing = results.filter((r) => r.status === 'pass').sort(byKey);
  const failing = results.filter((r) => r.status === 'fail').sort((a, b) => b.worstMarginK - a.worstMarginK || a.id.localeCompare(b.id));
  const excluded = results.filter((r) => r.status === 'excluded');
  const smallest = passing[0] ?? null;
  const steadyChoice = results.filter((r) => r.steady?.passes).sort(byKey)[0] ?? null;
  let thermalMassGain: RankingResult['thermalMassGain'] = null;
  if (smallest && steadyChoice && smallest.sortValue !== null && steadyChoice.sortValue !== null && steadyChoice.sortValue > 0) {
    thermalMassGain = {
      key: sortBy,
      smallest: smallest.sortValue,
      steady: steadyChoice.sortValue,
      fraction: 1 - smallest.sortValue / steadyChoice.sortValue,
    };
  }
  const result: RankingResult = {
    scenario: { airSpeedMPerS: airSpeed, ambientC, marginK, sortBy },
    required,
    ranked: [...passing, ...failing, ...excluded],
    passing,
    failing,
    excluded,
    smallest,
    steadyChoice,
    thermalMassGain,
    assumptions: [...(prep.enclosure ? enclosureAssumptions(prep.enclosure) : ASSUMPTIONS), ...(site ? [siteAssumption(site)] : [])],
    stats: { candidates: candidates.length, profileRuns, interiorSearches },
  };
  if (site) result.site = site;
  if (prep.enclosure) result.enclosure = { ...prep.enclosure };
  if (passing.length === 0) result.message = noPassMessage(required, failing, excluded);
  return result;
}

function siteAssumption(site: SiteDerating): string {
  return (
    `Every candidate is ranked at the site, ${site.altitudeM} m (standard-atmosphere pressure ratio ${site.pressureRatio.toFixed(3)}, ` +
    `radiation share ${site.radiationShare}): its still-air reference Rθsa and forced-air points are multiplied by 1/(s + (1 − s)·h/h0), ` +
    `h ∝ ρ^(2n) in still air, ρ^(1/2) in forced air.`
  );
}

function sortValue(c: CheckedCandidate, key: SortKey): number | null {
  const v = key === 'mass' ? c.massKg : key === 'volume' ? c.volumeM3 : c.price;
  return v === undefined ? null : v;
}

function noPassMessage(required: SteadyRequirement, failing: CandidateResult[], excluded: CandidateResult[]): string {
  if (!required.feasible && required.reason) return `No sink can meet the targets: ${required.reason}.`;
  if (failing.length === 0) {
    return excluded.length === 0 ? 'No candidates were given.' : 'No candidate could be simulated in this scenario (see each one’s reason).';
  }
  const best = failing[0];
  const device = best.devices.reduce((a, b) => (b.marginK < a.marginK ? b : a));
  return (
    `No candidate passes. The closest, "${best.name ?? best.id}", exceeds the target of "${device.id}" by ` +
    `${(-device.marginK).toFixed(2)} K; the steady answer needs Rθsa ≤ ${required.rsaKPerW.toPrecision(3)} K/W.`
  );
}
