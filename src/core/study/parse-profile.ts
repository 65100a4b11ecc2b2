import type { Device, Profile, ProfileSegment } from './types';
import { adjustableOutputV } from '../rails';
import {
  asArray,
  asObject,
  fieldPath,
  onlyKeys,
  rangeFail,
  asId,
  readNumber,
  readOptionalBoolean,
  readOptionalNumber,
  readOptionalString,
  typeFail,
  type Obj,
} from './field-reader';
import { MAX_EXPANDED_SEGMENTS } from './constants';

/**
 * The powerW of every segment that gives none: one frozen empty object, so the solver tells
 * "no entries" by identity instead of enumerating keys once per stretch.
 */
export const NO_POWER: Record<string, number> = Object.freeze({}) as Record<string, number>;

const SEGMENT_KEYS = ['durationS', 'powerW', 'vinV', 'voutV', 'iloadA', 'devices', 'label'];
const GROUP_KEYS = ['repeat', 'segments', 'label'];
const MAX_GROUP_DEPTH = 8;

type Context = { devices: Map<string, Device>; out: ProfileSegment[]; railPlan: boolean };

function parsePower(value: unknown, path: string, ctx: Context): Record<string, number> {
  const obj = asObject(value, path);
  const power: Record<string, number> = {};
  for (const id of Object.keys(obj)) {
    if (!ctx.devices.has(id)) rangeFail(fieldPath(path, id), `no device has the id ${JSON.stringify(id)}`);
    power[id] = readNumber(obj, id, path, { min: 0, unit: 'W' });
  }
  return power;
}

/** The set point of an electrical segment without voutV: the divider of every fed device, all alike. */
function dividerSetPoint(fed: Device[], path: string): number {
  const p = fieldPath(path, 'voutV');
  const without = fed.filter((d) => !d.electrical?.adjustable).map((d) => d.id);
  if (without.length > 0) typeFail(p, `is required (${without.join(', ')} ${without.length === 1 ? 'has' : 'have'} no electrical.adjustable divider to set it)`);
  const outputs = fed.map((d) => adjustableOutputV(d.electrical!.adjustable!));
  if (outputs.some((v) => Math.abs(v - outputs[0]) > 1e-9 * outputs[0])) {
    rangeFail(p, `is required: the fed devices' dividers set different outputs (${outputs.map((v) => `${v.toPrecision(4)} V`).join(', ')})`);
  }
  return outputs[0];
}

type Drives = Pick<ProfileSegment, 'electrical' | 'railDrive'>;

function parseDrive(obj: Obj, path: string, ctx: Context, power: Record<string, number>): Drives | undefined {
  const given = ['vinV', 'voutV', 'iloadA'].filter((k) => obj[k] !== undefined);
  if (given.length === 0) {
    if (obj.devices !== undefined) typeFail(fieldPath(path, 'devices'), 'only used with iloadA (and voutV, vinV)');
    return undefined;
  }
  let fed: string[];
  let listed: string[] | undefined;
  if (obj.devices !== undefined) {
    const listPath = fieldPath(path, 'devices');
    fed = listed = asArray(obj.devices, listPath, 1).map((item, i) => asId(item, fieldPath(listPath, i)));
    fed.forEach((id, i) => {
      const p = fieldPath(listPath, i);
      if (!ctx.devices.has(id)) rangeFail(p, `no device has the id ${JSON.stringify(id)}`);
      if (fed.indexOf(id) !== i) rangeFail(p, `lists ${JSON.stringify(id)} twice`);
    });
  } else {
    fed = [...ctx.devices.values()].filter((d) => (d.electrical?.role ?? 'pass') === 'pass').map((d) => d.id);
    if (fed.length === 0) rangeFail(path, 'has an electrical operating point but no device has the electrical role "pass"; add a devices list');
  }
  const iloadA = readNumber(obj, 'iloadA', path, { min: 0, unit: 'A' });
  const voutV = obj.voutV !== undefined ? readNumber(obj, 'voutV', path, { min: 0, unit: 'V' }) : dividerSetPoint(fed.map((id) => ctx.devices.get(id)!), path);
  for (const id of fed) {
    if (power[id] !== undefined) {
      rangeFail(fieldPath(fieldPath(path, 'powerW'), id), `device ${JSON.stringify(id)} is also fed by this segment's electrical operating point; give it one or the other (a devices list chooses which devices the drive feeds)`);
    }
  }
  const devices = listed ? { devices: listed } : {};
  if (ctx.railPlan) {
    if (obj.vinV !== undefined) typeFail(fieldPath(path, 'vinV'), 'leave it out: the railPlan supplies the input from the tap it selects');
    return { railDrive: { voutV, iloadA, ...devices } };
  }
  if (obj.vinV === undefined) typeFail(fieldPath(path, 'vinV'), 'is required (a study without a railPlan gives every electrical segment its input voltage)');
  return { electrical: { vinV: readNumber(obj, 'vinV', path, { min: 0, unit: 'V' }), voutV, iloadA, ...devices } };
}

function parseItem(value: unknown, path: string, ctx: Context, depth: number): void {
  const obj = asObject(value, path);
  if (obj.segments !== undefined || obj.repeat !== undefined) {
    if (depth >= MAX_GROUP_DEPTH) typeFail(path, `groups nest at most ${MAX_GROUP_DEPTH} deep`);
    onlyKeys(obj, GROUP_KEYS, path);
    readOptionalString(obj, 'label', path);
    const repeat = readNumber(obj, 'repeat', path, { min: 1, integer: true });
    const start = ctx.out.length;
    const listPath = fieldPath(path, 'segments');
    asArray(obj.segments, listPath, 1).forEach((item, i) => parseItem(item, fieldPath(listPath, i), ctx, depth + 1));
    const once = ctx.out.slice(start);
    if (start + once.length * repeat > MAX_EXPANDED_SEGMENTS) {
      rangeFail(fieldPath(path, 'repeat'), `the profile would expand to more than ${MAX_EXPANDED_SEGMENTS.toLocaleString('en')} segments`);
    }
    for (let r = 1; r < repeat; r++) for (const s of once) ctx.out.push(s);
    return;
  }
  onlyKeys(obj, SEGMENT_KEYS, path);
  const durationS = readNumber(obj, 'durationS', path, { min: 0, unit: 's' });
  const powerW = obj.powerW === undefined ? NO_POWER : parsePower(obj.powerW, fieldPath(path, 'powerW'), ctx);
  const segment: ProfileSegment = { durationS, powerW };
  const drive = parseDrive(obj, path, ctx, powerW);
  if (drive) Object.assign(segment, drive);
  const label = readOptionalString(obj, 'label', path);
  if (label !== undefined) segment.label = label;
  if (ctx.out.length >= MAX_EXPANDED_SEGMENTS) rangeFail(path, `the profile holds more than ${MAX_EXPANDED_SEGMENTS.toLocaleString('en')} segments`);
  ctx.out.push(segment);
}

/**
 * Parsed top-level profile items (a segment or a group) kept by their raw object, with the
 * context their parse depended on (the raw devices and rail-plan presence): an edited long
 * log is a new array of mostly the same item objects, so only the edited items are read again.
 */
export type ItemCache = { items: WeakMap<object, { context: string; segments: ProfileSegment[] }>; context: string };

/**
 * Reads `profile`, expanding nested `{ repeat, segments }` groups into a flat list. With a
 * rail plan, electrical segments leave out vinV and become `railDrive` segments. With an item
 * cache, a raw item met before in the same context gives its parsed segments without being read.
 */
export function parseProfile(value: unknown, path: string, devices: Device[], railPlan = false, cache?: ItemCache): Profile {
  const obj = asObject(value, path);
  onlyKeys(obj, ['segments', 'repeat', 'periodic'], path);
  const ctx: Context = { devices: new Map(devices.map((d) => [d.id, d])), out: [], railPlan };
  const listPath = fieldPath(path, 'segments');
  const items = asArray(obj.segments, listPath, 1);
  for (let i = 0; i < items.length; i++) {
    const item = items[i];
    const known = cache && item !== null && typeof item === 'object' ? cache.items.get(item) : undefined;
    // A known item is pushed as parsed; one that would pass the segment limit is read again, for its error.
    if (known && known.context === cache!.context && ctx.out.length + known.segments.length <= MAX_EXPANDED_SEGMENTS) {
      for (const s of known.segments) ctx.out.push(s);
      continue;
    }
    const start = ctx.out.length;
    parseItem(item, fieldPath(listPath, i), ctx, 0);
    if (cache && item !== null && typeof item === 'object') cache.items.set(item, { context: cache.context, segments: ctx.out.slice(start) });
  }
  let total = 0;
  for (const s of ctx.out) total += s.durationS;
  if (!(total > 0)) rangeFail(listPath, 'the total duration must be greater than zero');
  return {
    segments: ctx.out,
    repeat: readOptionalNumber(obj, 'repeat', path, { min: 1, integer: true, max: MAX_EXPANDED_SEGMENTS }) ?? 1,
    periodic: readOptionalBoolean(obj, 'periodic', path) ?? false,
  };
}
