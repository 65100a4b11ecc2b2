import type { Device, ElectricalDrive, Profile, ProfileSegment } from './types';
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

const SEGMENT_KEYS = ['durationS', 'powerW', 'vinV', 'voutV', 'iloadA', 'devices', 'label'];
const GROUP_KEYS = ['repeat', 'segments', 'label'];
const MAX_GROUP_DEPTH = 8;

type Context = { devices: Map<string, Device>; out: ProfileSegment[] };

function parsePower(value: unknown, path: string, ctx: Context): Record<string, number> {
  const obj = asObject(value, path);
  const power: Record<string, number> = {};
  for (const id of Object.keys(obj)) {
    if (!ctx.devices.has(id)) rangeFail(fieldPath(path, id), `no device has the id ${JSON.stringify(id)}`);
    power[id] = readNumber(obj, id, path, { min: 0, unit: 'W' });
  }
  return power;
}

function parseDrive(obj: Obj, path: string, ctx: Context, power: Record<string, number>): ElectricalDrive | undefined {
  const given = ['vinV', 'voutV', 'iloadA'].filter((k) => obj[k] !== undefined);
  if (given.length === 0) {
    if (obj.devices !== undefined) typeFail(fieldPath(path, 'devices'), 'only used with vinV, voutV and iloadA');
    return undefined;
  }
  const drive: ElectricalDrive = {
    vinV: readNumber(obj, 'vinV', path, { min: 0, unit: 'V' }),
    voutV: readNumber(obj, 'voutV', path, { min: 0, unit: 'V' }),
    iloadA: readNumber(obj, 'iloadA', path, { min: 0, unit: 'A' }),
  };
  let fed: string[];
  if (obj.devices !== undefined) {
    const listPath = fieldPath(path, 'devices');
    fed = asArray(obj.devices, listPath, 1).map((item, i) => asId(item, fieldPath(listPath, i)));
    fed.forEach((id, i) => {
      const p = fieldPath(listPath, i);
      if (!ctx.devices.has(id)) rangeFail(p, `no device has the id ${JSON.stringify(id)}`);
      if (fed.indexOf(id) !== i) rangeFail(p, `lists ${JSON.stringify(id)} twice`);
    });
    drive.devices = fed;
  } else {
    fed = [...ctx.devices.values()].filter((d) => (d.electrical?.role ?? 'pass') === 'pass').map((d) => d.id);
    if (fed.length === 0) rangeFail(path, 'has vinV, voutV and iloadA but no device has the electrical role "pass"; add a devices list');
  }
  for (const id of fed) {
    if (power[id] !== undefined) {
      rangeFail(fieldPath(fieldPath(path, 'powerW'), id), `device ${JSON.stringify(id)} is also fed by this segment's vinV/voutV/iloadA; give it one or the other (a devices list chooses which devices the drive feeds)`);
    }
  }
  return drive;
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
  const powerW = obj.powerW === undefined ? {} : parsePower(obj.powerW, fieldPath(path, 'powerW'), ctx);
  const segment: ProfileSegment = { durationS, powerW };
  const drive = parseDrive(obj, path, ctx, powerW);
  if (drive) segment.electrical = drive;
  const label = readOptionalString(obj, 'label', path);
  if (label !== undefined) segment.label = label;
  if (ctx.out.length >= MAX_EXPANDED_SEGMENTS) rangeFail(path, `the profile holds more than ${MAX_EXPANDED_SEGMENTS.toLocaleString('en')} segments`);
  ctx.out.push(segment);
}

/** Reads `profile`, expanding nested `{ repeat, segments }` groups into a flat list. */
export function parseProfile(value: unknown, path: string, devices: Device[]): Profile {
  const obj = asObject(value, path);
  onlyKeys(obj, ['segments', 'repeat', 'periodic'], path);
  const ctx: Context = { devices: new Map(devices.map((d) => [d.id, d])), out: [] };
  const listPath = fieldPath(path, 'segments');
  asArray(obj.segments, listPath, 1).forEach((item, i) => parseItem(item, fieldPath(listPath, i), ctx, 0));
  let total = 0;
  for (const s of ctx.out) total += s.durationS;
  if (!(total > 0)) rangeFail(listPath, 'the total duration must be greater than zero');
  return {
    segments: ctx.out,
    repeat: readOptionalNumber(obj, 'repeat', path, { min: 1, integer: true, max: MAX_EXPANDED_SEGMENTS }) ?? 1,
    periodic: readOptionalBoolean(obj, 'periodic', path) ?? false,
  };
}
