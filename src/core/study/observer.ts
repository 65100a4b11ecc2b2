import { advance, firstCrossing, peakInSegment, type ModalModel } from '../thermal';
import type { StudyModel } from './study-model';
import { createSeriesRecorder, type SeriesRecorder } from './series-recorder';
import { createBoundaryWriter, type BoundaryWriter } from './boundary-table';
import { createStretchBounds, type StretchBounds } from './stretch-bounds';
import type { JunctionHistory } from './junction-history';
import { SERIES_BUCKET_TOL_K } from './constants';

/** Chart and CSV names of the watched nodes, in watch order: junctions, cases, sinks, enclosure. */
export function watchedNodes(sm: StudyModel): { keys: string[]; nodes: number[] } {
  const keys: string[] = [];
  const nodes: number[] = [];
  sm.doc.devices.forEach((d, i) => {
    keys.push(`${d.id}.junction`, `${d.id}.case`);
    nodes.push(sm.junction[i], sm.case[i]);
  });
  sm.doc.sinks.forEach((s, i) => {
    keys.push(`${s.id}.sink`);
    nodes.push(sm.sink[i]);
  });
  if (sm.enclosure >= 0) {
    keys.push('enclosure.air');
    nodes.push(sm.enclosure);
  }
  return { keys, nodes };
}

export type ObserverOptions = { bucketS: number; bucketCount: number; series: boolean; maxRows: number; history?: JunctionHistory | null };

/**
 * Everything a run reports, gathered as it goes: exact peaks of the watched nodes, time of
 * each junction above its target, power per part, chart series and (optionally) CSV rows.
 */
export type Observer = {
  keys: string[];
  nodes: number[];
  peakC: Float64Array;
  peakTimeS: Float64Array;
  /** Row (time, watched nodes, ambient) at each peak, when rows are kept. */
  peakRows: (Float64Array | null)[];
  timeAboveS: Float64Array;
  targetC: Float64Array;
  peakPartPowerW: Float64Array;
  partEnergyJ: Float64Array;
  series: SeriesRecorder | null;
  rows: BoundaryWriter | null;
  /** Junction values for rainflow counting (a study with `lifetime`). */
  history: JunctionHistory | null;
};

export function createObserver(sm: StudyModel, options: ObserverOptions): Observer {
  const { keys, nodes } = watchedNodes(sm);
  const deviceCount = sm.doc.devices.length;
  return {
    keys,
    nodes,
    peakC: new Float64Array(nodes.length).fill(-Infinity),
    peakTimeS: new Float64Array(nodes.length),
    peakRows: nodes.map(() => null),
    timeAboveS: new Float64Array(deviceCount),
    targetC: Float64Array.from(sm.doc.devices, (d) => d.tjMaxC - sm.doc.marginK),
    peakPartPowerW: new Float64Array(deviceCount),
    partEnergyJ: new Float64Array(deviceCount),
    series: options.series ? createSeriesRecorder([...keys, 'ambient'], options.bucketS, options.bucketCount) : null,
    rows: options.maxRows > 0 ? createBoundaryWriter([...keys, 'ambient'], options.maxRows) : null,
    history: options.history ?? null,
  };
}

/** Records the state T (all nodes) at time t: a chart sample and a CSV row. */
export function sampleState(obs: Observer, t: number, T: ArrayLike<number>, ambientC: number): void {
  const { nodes } = obs;
  if (obs.series) {
    for (let w = 0; w < nodes.length; w++) obs.series.add(w, t, T[nodes[w]]);
    obs.series.add(nodes.length, t, ambientC);
  }
  if (obs.history) for (let w = 0; w < obs.targetC.length; w++) obs.history.add(w, t, T[nodes[2 * w]]);
  recordRow(obs, t, T, ambientC);
}

/** A CSV row only. */
export function recordRow(obs: Observer, t: number, T: ArrayLike<number>, ambientC: number): void {
  const { nodes } = obs;
  obs.rows?.push(t, (row, at) => {
    for (let w = 0; w < nodes.length; w++) row[at + w] = T[nodes[w]];
    row[at + nodes.length] = ambientC;
  });
}

/** Offers a candidate peak of watched node w; `stateAt` gives all node temperatures then (only called for CSV rows). */
export function offerPeak(obs: Observer, w: number, t: number, valueC: number, ambientC: number, stateAt: () => ArrayLike<number>): void {
  if (!(valueC > obs.peakC[w])) return;
  obs.peakC[w] = valueC;
  obs.peakTimeS[w] = t;
  if (obs.rows) {
    const T = stateAt();
    const row = new Float64Array(obs.nodes.length + 2);
    row[0] = t;
    obs.nodes.forEach((node, k) => (row[1 + k] = T[node]));
    // The exact peak, not the state recomputed at its time, which can differ in the last digits.
    row[1 + w] = valueC;
    row[obs.nodes.length + 1] = ambientC;
    obs.peakRows[w] = row;
  }
}

export function notePower(obs: Observer, partPowerW: ArrayLike<number>, h: number): void {
  for (let d = 0; d < partPowerW.length; d++) {
    if (h > 0 && partPowerW[d] > obs.peakPartPowerW[d]) obs.peakPartPowerW[d] = partPowerW[d];
    obs.partEnergyJ[d] += partPowerW[d] * h;
  }
}

/**
 * Seconds node spends at or above levelC during a constant-input stretch, from its level
 * crossings. After each crossing the search restarts a hair later (CROSSING_NUDGE of the
 * stretch) so a start sitting on the level cannot be found again; an exponential sum of n
 * modes crosses a level at most n times, which bounds the loop.
 */
const CROSSING_NUDGE = 1e-12;

export function timeAtOrAbove(model: ModalModel, T: Float64Array, u: ArrayLike<number>, h: number, node: number, levelC: number, scratch: Float64Array): number {
  scratch.set(T);
  let above = scratch[node] >= levelC;
  let t = 0;
  let total = 0;
  const nudge = CROSSING_NUDGE * h;
  for (let k = 0; k <= model.modeCount + 2 && t < h; k++) {
    const tc = firstCrossing(model, scratch, u, h - t, node, levelC, above ? 'down' : 'up');
    if (tc === null) {
      if (above) total += h - t;
      return total;
    }
    const step = Math.min(h - t, tc + nudge);
    if (above) total += step;
    advance(model, scratch, u, step, scratch);
    t += step;
    above = !above;
  }
  if (above) total += h - t;
  return total;
}

/**
 * Observes one constant-input stretch [t, t + h] from state T: sample at its start, exact
 * peaks of every watched node (interior ones included), time above target.
 */
/** Bounds below the best value by less than this (K) still trigger the exact search, for round-off. */
const BOUND_SLACK_K = 1e-9;

const boundsCache = new WeakMap<ModalModel, StretchBounds>();

/** Bounds of a stretch for this model (one workspace per compiled model). */
export function boundsFor(model: ModalModel): StretchBounds {
  let b = boundsCache.get(model);
  if (!b) boundsCache.set(model, (b = createStretchBounds(model)));
  return b;
}

const reached = new Float64Array(2);

/**
 * Adds a chart point within SERIES_BUCKET_TOL_K of the stretch's maximum of watched node w,
 * from the stretch bounds alone (a point on the exact curve, met by their branch and bound);
 * false when the exact search has to run: the bounds did not settle, or the node is a
 * junction whose interior peaks feed the lifetime count.
 */
function bucketMaxWithin(obs: Observer, bounds: StretchBounds, w: number, t: number, h: number, devices: number): boolean {
  if (obs.history && w % 2 === 0 && w < 2 * devices) return false;
  const node = obs.nodes[w];
  // The ends are sampled anyway (this stretch's start, the next one's start or the final sample).
  if (bounds.upper(node) - bounds.endMax(node) <= SERIES_BUCKET_TOL_K) return true;
  if (Number.isNaN(bounds.maxWithin(node, SERIES_BUCKET_TOL_K, reached))) return false;
  if (reached[1] > 0 && reached[1] < h) obs.series!.add(w, t + reached[1], reached[0]);
  return true;
}

export function observeStretch(
  obs: Observer,
  sm: StudyModel,
  model: ModalModel,
  T: Float64Array,
  u: ArrayLike<number>,
  t: number,
  h: number,
  ambientC: number,
  scratch: Float64Array,
): void {
  sampleState(obs, t, T, ambientC);
  if (h === 0) return;
  const { nodes, series } = obs;
  const bounds = boundsFor(model);
  bounds.load(T, u, h);
  const devices = sm.doc.devices.length;
  for (let w = 0; w < nodes.length; w++) {
    const upper = bounds.upper(nodes[w]) + BOUND_SLACK_K;
    // The exact search runs only where it could raise the peak, or the chart bucket's
    // maximum when the bounds cannot settle that to SERIES_BUCKET_TOL_K.
    if (upper > obs.peakC[w] || (series && upper > series.maxAt(w, t) && !bucketMaxWithin(obs, bounds, w, t, h, devices))) {
      const pk = peakInSegment(model, T, u, h, nodes[w]);
      offerPeak(obs, w, t + pk.timeS, pk.valueC, ambientC, () => advance(model, T, u, pk.timeS, scratch));
      if (series && pk.timeS > 0 && pk.timeS < h) series.add(w, t + pk.timeS, pk.valueC);
      if (obs.history && w % 2 === 0 && w < 2 * devices && pk.timeS > 0 && pk.timeS < h) obs.history.add(w / 2, t + pk.timeS, pk.valueC);
    }
    // Junctions are the even watch slots of the first 2 × devices.
    if (w % 2 === 0 && w < 2 * devices && upper >= obs.targetC[w / 2]) {
      obs.timeAboveS[w / 2] += timeAtOrAbove(model, T, u, h, nodes[w], obs.targetC[w / 2], scratch);
    }
  }
}
