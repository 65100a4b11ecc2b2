import { compileRailPlan, MAP_IOUT_STEPS, MAP_VOUT_STEPS, type RailSource, type Tap, type TapCircuit } from '../rails';
import type { Device, StudyRailPlan } from './types';
import {
  asArray,
  asId,
  asNumber,
  asObject,
  fieldPath,
  onlyKeys,
  rangeFail,
  readId,
  readNumber,
  readOptionalNumber,
  readOptionalString,
  readString,
  typeFail,
  type Obj,
} from './field-reader';

/** Circuits nest at most this deep (series of parallels of series …). */
const MAX_CIRCUIT_DEPTH = 8;
/** Largest map grid: its cells go into every result. */
export const MAX_MAP_VOUT_STEPS = 201;
export const MAX_MAP_IOUT_STEPS = 101;

const volts = { min: 0, unit: 'V' };

function pathParts(obj: Obj, path: string): { diodeV?: number; ballastOhm?: number } {
  const out: { diodeV?: number; ballastOhm?: number } = {};
  const diodeV = readOptionalNumber(obj, 'diodeV', path, volts);
  const ballastOhm = readOptionalNumber(obj, 'ballastOhm', path, { min: 0, unit: 'Ω' });
  if (diodeV !== undefined) out.diodeV = diodeV;
  if (ballastOhm !== undefined) out.ballastOhm = ballastOhm;
  return out;
}

function parseCircuit(value: unknown, path: string, sources: Set<string>, depth: number): TapCircuit {
  if (depth > MAX_CIRCUIT_DEPTH) typeFail(path, `circuits nest at most ${MAX_CIRCUIT_DEPTH} deep`);
  const obj = asObject(value, path);
  const kind = readString(obj, 'kind', path);
  if (kind === 'source') {
    onlyKeys(obj, ['kind', 'source', 'diodeV', 'ballastOhm'], path);
    const source = readId(obj, 'source', path);
    if (!sources.has(source)) rangeFail(fieldPath(path, 'source'), `no source has the id ${JSON.stringify(source)} (sources: ${[...sources].join(', ')})`);
    return { kind, source, ...pathParts(obj, path) };
  }
  if (kind === 'series') {
    onlyKeys(obj, ['kind', 'parts', 'diodeV', 'ballastOhm'], path);
    const listPath = fieldPath(path, 'parts');
    const parts = asArray(obj.parts, listPath, 1).map((c, i) => parseCircuit(c, fieldPath(listPath, i), sources, depth + 1));
    return { kind, parts, ...pathParts(obj, path) };
  }
  if (kind === 'parallel') {
    onlyKeys(obj, ['kind', 'branches', 'mismatchV', 'diodeV', 'ballastOhm'], path);
    const listPath = fieldPath(path, 'branches');
    const branches = asArray(obj.branches, listPath, 1).map((c, i) => parseCircuit(c, fieldPath(listPath, i), sources, depth + 1));
    const circuit: TapCircuit = { kind, branches, ...pathParts(obj, path) };
    const mismatchV = readOptionalNumber(obj, 'mismatchV', path, volts);
    if (mismatchV !== undefined) circuit.mismatchV = mismatchV;
    return circuit;
  }
  return rangeFail(fieldPath(path, 'kind'), `must be "source", "series" or "parallel", got ${JSON.stringify(kind)}`);
}

function parseSources(value: unknown, path: string): RailSource[] {
  const seen = new Map<string, string>();
  return asArray(value, path, 1).map((item, i) => {
    const p = fieldPath(path, i);
    const obj = asObject(item, p);
    onlyKeys(obj, ['id', 'vocV', 'rsOhm', 'imaxA', 'notes'], p);
    readOptionalString(obj, 'notes', p);
    const id = readId(obj, 'id', p);
    const first = seen.get(id);
    if (first !== undefined) rangeFail(fieldPath(p, 'id'), `duplicate id ${JSON.stringify(id)} (already used by ${first})`);
    seen.set(id, p);
    return {
      id,
      vocV: readNumber(obj, 'vocV', p, { min: 0, exclusive: true, unit: 'V' }),
      rsOhm: readNumber(obj, 'rsOhm', p, { min: 0, unit: 'Ω' }),
      imaxA: readNumber(obj, 'imaxA', p, { min: 0, exclusive: true, unit: 'A' }),
    };
  });
}

function parseMap(value: unknown, path: string): StudyRailPlan['map'] {
  const obj = asObject(value, path);
  onlyKeys(obj, ['voutMinV', 'voutMaxV', 'ioutMaxA', 'voutSteps', 'ioutSteps'], path);
  const voutMinV = readNumber(obj, 'voutMinV', path, volts);
  return {
    voutMinV,
    voutMaxV: readNumber(obj, 'voutMaxV', path, { min: voutMinV, exclusive: true, unit: 'V' }),
    ioutMaxA: readNumber(obj, 'ioutMaxA', path, { min: 0, exclusive: true, unit: 'A' }),
    voutSteps: readOptionalNumber(obj, 'voutSteps', path, { min: 2, max: MAX_MAP_VOUT_STEPS, integer: true }) ?? MAP_VOUT_STEPS,
    ioutSteps: readOptionalNumber(obj, 'ioutSteps', path, { min: 2, max: MAX_MAP_IOUT_STEPS, integer: true }) ?? MAP_IOUT_STEPS,
  };
}

/** The device entry the plan feeds: given, or the only one whose electrical role is "pass". */
function planDevice(obj: Obj, path: string, devices: Device[]): string {
  if (obj.device !== undefined) {
    const id = asId(obj.device, fieldPath(path, 'device'));
    if (!devices.some((d) => d.id === id)) rangeFail(fieldPath(path, 'device'), `no device has the id ${JSON.stringify(id)}`);
    return id;
  }
  const pass = devices.filter((d) => (d.electrical?.role ?? 'pass') === 'pass');
  if (pass.length !== 1) {
    typeFail(fieldPath(path, 'device'), `is required when ${pass.length === 0 ? 'no device has' : 'several devices have'} the electrical role "pass" (name the device the plan feeds)`);
  }
  return pass[0].id;
}

/**
 * Reads `railPlan` (PHYSICS.md §2) and checks it with the rail-plan core, whose messages are
 * given the document's path (`railPlan.taps[1]: …`).
 */
export function parseRailPlan(value: unknown, path: string, devices: Device[]): StudyRailPlan {
  const obj = asObject(value, path);
  onlyKeys(obj, ['device', 'sources', 'taps', 'thresholdsV', 'hysteresisV', 'sensed', 'relay', 'map', 'notes'], path);
  readOptionalString(obj, 'notes', path);
  const device = planDevice(obj, path, devices);
  const sources = parseSources(obj.sources, fieldPath(path, 'sources'));
  const ids = new Set(sources.map((s) => s.id));
  const tapsPath = fieldPath(path, 'taps');
  const taps: Tap[] = asArray(obj.taps, tapsPath, 1).map((item, i) => {
    const p = fieldPath(tapsPath, i);
    const tap = asObject(item, p);
    onlyKeys(tap, ['name', 'circuit', 'notes'], p);
    readOptionalString(tap, 'notes', p);
    const name = readString(tap, 'name', p).trim();
    if (name === '') rangeFail(fieldPath(p, 'name'), 'must not be empty');
    return { name, circuit: parseCircuit(tap.circuit, fieldPath(p, 'circuit'), ids, 1) };
  });
  const thPath = fieldPath(path, 'thresholdsV');
  const thresholdsV = asArray(obj.thresholdsV, thPath).map((v, i) => asNumber(v, fieldPath(thPath, i), { unit: 'V' }));
  const sensed = readString(obj, 'sensed', path);
  if (sensed !== 'output' && sensed !== 'set-point') rangeFail(fieldPath(path, 'sensed'), `must be "output" or "set-point", got ${JSON.stringify(sensed)}`);
  const plan: StudyRailPlan = {
    device,
    sources,
    taps,
    thresholdsV,
    hysteresisV: readNumber(obj, 'hysteresisV', path, volts),
    sensed,
    map: parseMap(obj.map, fieldPath(path, 'map')),
  };
  if (obj.relay !== undefined) {
    const p = fieldPath(path, 'relay');
    const relay = asObject(obj.relay, p);
    onlyKeys(relay, ['breakTimeS', 'inputCapacitanceF'], p);
    plan.relay = {
      breakTimeS: readNumber(relay, 'breakTimeS', p, { min: 0, unit: 's' }),
      inputCapacitanceF: readNumber(relay, 'inputCapacitanceF', p, { min: 0, exclusive: true, unit: 'F' }),
    };
  }
  try {
    compileRailPlan(plan);
  } catch (e) {
    if (!(e instanceof RangeError || e instanceof TypeError)) throw e;
    const message = e.message.replace(/^plan\b/, path);
    throw e instanceof RangeError ? new RangeError(message) : new TypeError(message);
  }
  return plan;
}
