import { fosterToCauer, type CauerStage, type LinkSpec, type NodeSpec } from '../thermal';
import type { PackageModel } from '../study/types';
import { checkArray, checkFinite, checkInteger, checkNonNegative, checkObject, checkPositive, checkString } from './check';

/** A device on the sink slot: per-part package and interface, `count` identical parts. */
export type RankingDevice = {
  id: string;
  name?: string;
  tjMaxC: number;
  package: PackageModel;
  /** Case to sink, K/W, per part. */
  interfaceRthKPerW: number;
  count?: number;
};

/**
 * The air inside a housing that the sink sheds into: its Rθ to the room, K/W (as used: any
 * site derating already applied), and the heat capacity of the air and walls, J/K (0: none).
 */
export type RankingEnclosure = { rthKPerW: number; capacityJPerK?: number };

/** A constant-power stretch: watts in each part of the named devices (missing ones: 0 W). */
export type RankingSegment = { durationS: number; powerW: Record<string, number> };

/**
 * What the ranking simulates: the devices that share one sink, the power profile, the
 * ambient and the junction margin (target = Tj,max − margin). periodic: the profile repeats
 * forever (its periodic steady state); otherwise it starts with everything at ambient.
 * enclosure: the sink leads to the enclosure air, one node between it and the ambient;
 * without it the sink leads straight to the ambient.
 */
export type RankingSetup = {
  devices: RankingDevice[];
  segments: RankingSegment[];
  periodic?: boolean;
  ambientC: number;
  marginK: number;
  enclosure?: RankingEnclosure;
};

export type PreparedDevice = {
  id: string;
  name?: string;
  tjMaxC: number;
  count: number;
  /** Per part, junction first. */
  stages: CauerStage[];
  rjcKPerW: number;
  rcsKPerW: number;
};

/**
 * A setup checked and laid out once for any number of candidates and what-ifs: the device
 * part of the network (the sink node and its Rθsa are added per candidate), the profile as
 * flat arrays, and the distinct power rows for the steady answer.
 */
export type PreparedRanking = {
  devices: PreparedDevice[];
  periodic: boolean;
  ambientC: number;
  marginK: number;
  /** The enclosure air the sink leads to (node ENCLOSURE_NODE_ID), or null: straight to the ambient. */
  enclosure: { rthKPerW: number; capacityJPerK: number } | null;
  nodes: NodeSpec[];
  links: LinkSpec[];
  junctionIds: string[];
  /** Node capacities of the device part, J/K (for the energy balance). */
  deviceCapacityJPerK: number;
  durations: Float64Array;
  /** Segments × devices, W into each device entry (count × per part). */
  entryPowerW: Float64Array;
  totalTimeS: number;
  /** Time-averaged total power, W. */
  meanPowerW: number;
  /** Energy put in over the profile, J. */
  energyJ: number;
  /** Distinct per-part power rows no other row dominates (rows × devices), with a segment of each. */
  steadyRows: Float64Array;
  steadyRowSegment: Int32Array;
};

export const SINK_NODE_ID = 'sink';
export const ENCLOSURE_NODE_ID = 'enclosure';

function checkEnclosure(raw: unknown): PreparedRanking['enclosure'] {
  if (raw === undefined) return null;
  const e = checkObject(raw, 'setup.enclosure');
  return {
    rthKPerW: checkPositive(e.rthKPerW, 'setup.enclosure.rthKPerW'),
    capacityJPerK: e.capacityJPerK === undefined ? 0 : checkNonNegative(e.capacityJPerK, 'setup.enclosure.capacityJPerK'),
  };
}

function packageStages(model: PackageModel, path: string): CauerStage[] {
  const obj = checkObject(model, path);
  if (obj.kind === 'cauer') {
    return checkArray(obj.stages, `${path}.stages`, 1).map((s, i) => {
      const p = `${path}.stages[${i}]`;
      const st = checkObject(s, p);
      return { rKPerW: checkPositive(st.rKPerW, `${p}.rKPerW`), capacityJPerK: checkNonNegative(st.capacityJPerK, `${p}.capacityJPerK`) };
    });
  }
  if (obj.kind === 'foster') {
    const terms = checkArray(obj.terms, `${path}.terms`, 1).map((t, i) => {
      const p = `${path}.terms[${i}]`;
      const term = checkObject(t, p);
      return { rKPerW: checkPositive(term.rKPerW, `${p}.rKPerW`), tauS: checkPositive(term.tauS, `${p}.tauS`) };
    });
    // A Foster set is only valid against a fixed case: chain its equivalent ladder (PHYSICS.md §3).
    return fosterToCauer(terms);
  }
  if (obj.kind === 'lumped') {
    return [{ rKPerW: checkPositive(obj.rthKPerW, `${path}.rthKPerW`), capacityJPerK: checkNonNegative(obj.capacityJPerK, `${path}.capacityJPerK`) }];
  }
  throw new RangeError(`${path}.kind: must be "foster", "cauer" or "lumped", got ${JSON.stringify(obj.kind)}`);
}

export function prepareRanking(setup: RankingSetup): PreparedRanking {
  const root = checkObject(setup, 'setup');
  const ambientC = checkFinite(root.ambientC, 'setup.ambientC');
  const marginK = checkNonNegative(root.marginK, 'setup.marginK');
  const enclosure = checkEnclosure(root.enclosure);
  const seen = new Set<string>();
  const devices = checkArray(root.devices, 'setup.devices', 1).map((raw, i): PreparedDevice => {
    const path = `setup.devices[${i}]`;
    const d = checkObject(raw, path);
    const id = checkString(d.id, `${path}.id`);
    if (seen.has(id)) throw new RangeError(`${path}.id: "${id}" is used by an earlier device`);
    seen.add(id);
    const stages = packageStages(d.package as PackageModel, `${path}.package`);
    const device: PreparedDevice = {
      id,
      tjMaxC: checkFinite(d.tjMaxC, `${path}.tjMaxC`),
      count: d.count === undefined ? 1 : checkInteger(d.count, `${path}.count`, 1),
      stages,
      rjcKPerW: stages.reduce((sum, s) => sum + s.rKPerW, 0),
      rcsKPerW: checkNonNegative(d.interfaceRthKPerW, `${path}.interfaceRthKPerW`),
    };
    if (d.name !== undefined) device.name = checkString(d.name, `${path}.name`);
    return device;
  });

  // `count` identical parts stay at one temperature by symmetry: one chain with R/count, C·count.
  const nodes: NodeSpec[] = [];
  const links: LinkSpec[] = [];
  const junctionIds: string[] = [];
  let deviceCapacity = 0;
  devices.forEach((d, i) => {
    const ids = d.stages.map((_, k) => `d${i}.${k + 1}`);
    // A zero interface ties the last package stage straight to the sink.
    const end = d.rcsKPerW > 0 ? `d${i}.case` : SINK_NODE_ID;
    d.stages.forEach((s, k) => {
      nodes.push({ id: ids[k], capacityJPerK: s.capacityJPerK * d.count });
      links.push({ a: ids[k], b: k + 1 < ids.length ? ids[k + 1] : end, rKPerW: s.rKPerW / d.count });
      deviceCapacity += s.capacityJPerK * d.count;
    });
    if (d.rcsKPerW > 0) {
      nodes.push({ id: end, capacityJPerK: 0 });
      links.push({ a: end, b: SINK_NODE_ID, rKPerW: d.rcsKPerW / d.count });
    }
    junctionIds.push(ids[0]);
  });

  const m = devices.length;
  const index = new Map(devices.map((d, i) => [d.id, i]));
  const segs = checkArray(root.segments, 'setup.segments', 1);
  const S = segs.length;
  const durations = new Float64Array(S);
  const entryPowerW = new Float64Array(S * m);
  const partPowerW = new Float64Array(S * m);
  let energy = 0;
  segs.forEach((raw, s) => {
    const path = `setup.segments[${s}]`;
    const seg = checkObject(raw, path);
    durations[s] = checkNonNegative(seg.durationS, `${path}.durationS`);
    const power = checkObject(seg.powerW, `${path}.powerW`);
    for (const [id, watts] of Object.entries(power)) {
      const i = index.get(id);
      if (i === undefined) throw new RangeError(`${path}.powerW.${id}: no device has the id "${id}"`);
      const p = checkNonNegative(watts, `${path}.powerW.${id}`);
      partPowerW[s * m + i] = p;
      entryPowerW[s * m + i] = p * devices[i].count;
      energy += p * devices[i].count * durations[s];
    }
  });
  let total = 0;
  for (let s = 0; s < S; s++) total += durations[s];
  const periodic = root.periodic === undefined ? false : root.periodic === true;
  if (root.periodic !== undefined && typeof root.periodic !== 'boolean') throw new TypeError('setup.periodic: expected true or false');
  if (periodic && !(total > 0)) throw new RangeError('setup.segments: a periodic profile needs a period longer than 0 s');
  const rows = dominantRows(partPowerW, durations, devices, m);

  return {
    devices,
    periodic,
    ambientC,
    marginK,
    enclosure,
    nodes,
    links,
    junctionIds,
    deviceCapacityJPerK: deviceCapacity,
    durations,
    entryPowerW,
    totalTimeS: total,
    meanPowerW: total > 0 ? energy / total : 0,
    energyJ: energy,
    steadyRows: rows.values,
    steadyRowSegment: rows.segments,
  };
}

/**
 * Distinct per-part power rows of segments with a duration, dropping any row another one
 * dominates (no larger in every device): held forever, a dominated row is never the worst.
 */
function dominantRows(power: Float64Array, durations: Float64Array, devices: PreparedDevice[], m: number): { values: Float64Array; segments: Int32Array } {
  const seen = new Map<string, number>();
  for (let s = 0; s < durations.length; s++) {
    if (!(durations[s] > 0)) continue;
    const key = Array.prototype.join.call(power.subarray(s * m, s * m + m), ',');
    if (!seen.has(key)) seen.set(key, s);
  }
  const order = [...seen.values()];
  const total = (s: number) => devices.reduce((sum, d, i) => sum + power[s * m + i] * d.count, 0);
  order.sort((a, b) => total(b) - total(a));
  const kept: number[] = [];
  for (const s of order) {
    const dominated = kept.some((k) => {
      for (let i = 0; i < m; i++) if (power[s * m + i] > power[k * m + i]) return false;
      return true;
    });
    if (!dominated) kept.push(s);
  }
  const values = new Float64Array(kept.length * m);
  kept.forEach((s, r) => values.set(power.subarray(s * m, s * m + m), r * m));
  return { values, segments: Int32Array.from(kept) };
}
