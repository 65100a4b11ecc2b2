import { MAX_SOLVED_PIECES } from './constants';
import { AMBIENT, compileNetwork, type CauerStage, type ModalModel, type NetworkSpec } from '../thermal';
import type { StudyDocument } from './types';
import { buildStudyNetwork, caseNodeId, ENCLOSURE_NODE_ID, packageStages, sinkNodeId, sinkTargetNode } from './build-network';
import { sinkRsa } from './convection';

const MAX_CACHED_MODELS = 256;
/** Compiled networks kept across evaluations (a live edit solves the same network again). */
const MAX_SHARED_MODELS = 512;
const sharedModels = new Map<string, ModalModel>();

/** Numbers JSON cannot hold (±Infinity, NaN) spelled out, so no two specs share a key. */
const specKey = (spec: NetworkSpec) => JSON.stringify(spec, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? `#${v}` : v));

/**
 * compileNetwork, remembered by the network's full description: the same spec always
 * compiles to the same model (read-only), so an evaluation reuses the last ones' models.
 */
function compileShared(spec: NetworkSpec): ModalModel {
  const key = specKey(spec);
  let model = sharedModels.get(key);
  if (model) {
    // Most recently used last: the oldest is dropped first.
    sharedModels.delete(key);
  } else {
    model = compileNetwork(spec);
    if (sharedModels.size >= MAX_SHARED_MODELS) sharedModels.delete(sharedModels.keys().next().value!);
  }
  sharedModels.set(key, model);
  return model;
}

/**
 * The compiled networks of a study. Sinks with natural convection make Rθsa depend on their
 * rise, so models are compiled per set of Rθsa values, rounded to a geometric grid of ratio
 * 1 + tolerance and cached: a value on the grid lies within tolerance/2 of the exact one.
 */
export type StudyModel = {
  doc: StudyDocument;
  /** Network with every Rθsa at its given value (the reference of natural convection). */
  referenceSpec: NetworkSpec;
  reference: ModalModel;
  /** Node indices (same in every compiled model): per device, per sink, the enclosure or −1. */
  junction: number[];
  case: number[];
  sink: number[];
  /** Index of the node each sink's Rθsa leads to; −1 for the ambient. */
  sinkTo: number[];
  enclosure: number;
  /** Nodes with a heat capacity: the state of the network (massless nodes follow the inputs). */
  dynamicNodes: number[];
  /** Sinks whose Rθsa depends on their rise. */
  nonLinearSinks: number[];
  tolerance: number;
  /** Model for the rises in `temperatures` (°C per node) with ambient ambientC; `rsaOut` gets the Rθsa used. */
  modelAt(temperatures: ArrayLike<number>, ambientC: number, rsaOut?: Float64Array): ModalModel;
  /** Largest relative gap between the Rθsa a state calls for and `rsaUsed`. */
  rsaMismatch(temperatures: ArrayLike<number>, ambientC: number, rsaUsed: ArrayLike<number>): number;
  compiledCount(): number;
  /** Stretches solved so far by the event-driven path over the whole evaluation, and its limit. */
  work: { stretches: number; limit: number };
};

export function createStudyModel(doc: StudyDocument, tolerance: number): StudyModel {
  const stages: CauerStage[][] = doc.devices.map((d) => packageStages(d.package));
  const givenRsa = Float64Array.from(doc.sinks, (s) => s.rthKPerW);
  const network = buildStudyNetwork(doc, stages, givenRsa);
  const referenceSpec = network.spec;
  const reference = compileShared(referenceSpec);
  const index = (id: string) => reference.nodeIndex.get(id)!;
  const junction = network.junctions.map(index);
  const sink = doc.sinks.map((s) => index(sinkNodeId(s.id)));
  const sinkTo = doc.sinks.map((s) => {
    const target = sinkTargetNode(s.to);
    return target === AMBIENT ? -1 : index(target);
  });
  const nonLinearSinks = doc.sinks.flatMap((s, i) => (s.naturalConvection ? [i] : []));
  const cache = new Map<string, ModalModel>();
  const logStep = Math.log1p(tolerance);
  const rsa = new Float64Array(doc.sinks.length);

  /** The Rθsa level (steps of the tolerance from the given value) per non-linear sink last asked for, and its model. */
  const levels = new Float64Array(nonLinearSinks.length).fill(NaN);
  let lastModel: ModalModel | null = null;

  const rise = (T: ArrayLike<number>, ambientC: number, i: number) => T[sink[i]] - (sinkTo[i] < 0 ? ambientC : T[sinkTo[i]]);

  function modelAt(T: ArrayLike<number>, ambientC: number, rsaOut?: Float64Array): ModalModel {
    rsa.set(givenRsa);
    if (nonLinearSinks.length === 0) {
      rsaOut?.set(rsa);
      return reference;
    }
    let same = lastModel !== null;
    for (let j = 0; j < nonLinearSinks.length; j++) {
      const i = nonLinearSinks[j];
      const exact = sinkRsa(doc.sinks[i], rise(T, ambientC, i));
      const k = Math.round(Math.log(exact / givenRsa[i]) / logStep);
      rsa[i] = givenRsa[i] * Math.exp(k * logStep);
      if (k !== levels[j]) same = false;
      levels[j] = k;
    }
    rsaOut?.set(rsa);
    // Consecutive stretches mostly stay on one Rθsa level: no key is built for them.
    if (same) return lastModel!;
    let key = '';
    for (let j = 0; j < levels.length; j++) key += `${levels[j]},`;
    let model = cache.get(key);
    if (!model) {
      if (cache.size >= MAX_CACHED_MODELS) cache.clear();
      model = compileShared(buildStudyNetwork(doc, stages, rsa).spec);
      cache.set(key, model);
    }
    lastModel = model;
    return model;
  }

  function rsaMismatch(T: ArrayLike<number>, ambientC: number, rsaUsed: ArrayLike<number>): number {
    let worst = 0;
    for (const i of nonLinearSinks) {
      const exact = sinkRsa(doc.sinks[i], rise(T, ambientC, i));
      worst = Math.max(worst, Math.abs(exact / rsaUsed[i] - 1));
    }
    return worst;
  }

  return {
    doc,
    referenceSpec,
    reference,
    junction,
    case: doc.devices.map((d) => index(caseNodeId(d.id))),
    sink,
    sinkTo,
    enclosure: doc.enclosure ? index(ENCLOSURE_NODE_ID) : -1,
    dynamicNodes: referenceSpec.nodes.flatMap((node, i) => (node.capacityJPerK > 0 ? [i] : [])),
    nonLinearSinks,
    tolerance,
    modelAt,
    rsaMismatch,
    compiledCount: () => cache.size + 1,
    work: { stretches: 0, limit: MAX_SOLVED_PIECES },
  };
}
