import { STUDY_FORMAT, STUDY_VERSION, type Device, type Profile, type Sink, type StudyDocument } from './types';
import {
  asArray,
  asObject,
  fieldPath,
  findNonFinite,
  onlyKeys,
  rangeFail,
  readOptionalBoolean,
  readOptionalNumber,
  readOptionalString,
  readString,
  typeFail,
} from './field-reader';
import { parseAmbient, parseEnclosure } from './parse-ambient';
import { parseSink } from './parse-sink';
import { parseDevice } from './parse-device';
import { parseProfile, type ItemCache } from './parse-profile';
import { parseRailPlan } from './parse-rail-plan';
import { DEFAULT_MARGIN_K } from './constants';
import { parseLifetime, parseSite, parseTouch } from './parse-reliability';

const TOP_KEYS = ['format', 'version', 'title', 'description', 'notes', 'mainsFed', 'marginK', 'ambient', 'enclosure', 'sinks', 'devices', 'profile', 'railPlan', 'site', 'lifetime', 'touch'];
const RESERVED_IDS = ['ambient', 'enclosure'];

function checkUniqueIds(items: { id: string }[], listPath: string, taken: Map<string, string>): void {
  items.forEach((item, i) => {
    const path = fieldPath(fieldPath(listPath, i), 'id');
    if (RESERVED_IDS.includes(item.id)) rangeFail(path, `${JSON.stringify(item.id)} is reserved; choose another id`);
    const first = taken.get(item.id);
    if (first !== undefined) rangeFail(path, `duplicate id ${JSON.stringify(item.id)} (already used by ${first})`);
    taken.set(item.id, fieldPath(listPath, i));
  });
}

/** Every sink's Rθsa chain must end at the ambient (through the enclosure when there is one). */
function checkSinkPaths(sinks: Sink[], hasEnclosure: boolean): void {
  const index = new Map(sinks.map((s, i) => [s.id, i]));
  sinks.forEach((sink, i) => {
    const path = fieldPath(fieldPath('sinks', i), 'to');
    if (sink.to === 'ambient') return;
    if (sink.to === 'enclosure') {
      if (!hasEnclosure) rangeFail(path, 'leads to "enclosure" but the study has no enclosure');
      return;
    }
    if (!index.has(sink.to)) rangeFail(path, `no sink has the id ${JSON.stringify(sink.to)} (use a sink id, "enclosure" or "ambient")`);
    if (sink.to === sink.id) rangeFail(path, 'a sink cannot lead to itself: it would have no path to ambient');
  });
  sinks.forEach((sink, i) => {
    const chain = [sink.id];
    let at = sink;
    while (at.to !== 'ambient' && at.to !== 'enclosure') {
      at = sinks[index.get(at.to)!];
      if (chain.includes(at.id)) {
        rangeFail(fieldPath(fieldPath('sinks', i), 'to'), `the sinks ${[...chain, at.id].join(' → ')} form a loop with no path to ambient`);
      }
      chain.push(at.id);
    }
  });
}

function withoutProfile(root: Record<string, unknown>): Record<string, unknown> {
  const rest = { ...root };
  delete rest.profile;
  return rest;
}

function checkDeviceSinks(devices: Device[], sinks: Sink[]): void {
  const ids = new Set(sinks.map((s) => s.id));
  devices.forEach((device, i) => {
    if (!ids.has(device.sink)) {
      rangeFail(fieldPath(fieldPath('devices', i), 'sink'), `no sink has the id ${JSON.stringify(device.sink)} (sinks: ${[...ids].join(', ')})`);
    }
  });
}

/**
 * Parsed profiles kept by their raw profile object, for a caller that parses one document
 * again and again as it is edited (the live solver) and hands back the same raw profile object
 * while the profile is unchanged. A raw document given to parseStudy with a cache must not be
 * changed in place afterwards, and a parsed document must not be changed: the profile is shared.
 */
export type ParseCache = {
  profiles: WeakMap<object, { context: string; profile: Profile }>;
  /** Parsed profile items by raw item object: an edit of a long log reads only the items it changed. */
  items: ItemCache['items'];
};

export const createParseCache = (): ParseCache => ({ profiles: new WeakMap(), items: new WeakMap() });

/**
 * Checks a study document (format "junctura-study", version 1) and returns it with defaults
 * filled in and profile groups expanded. Throws a TypeError (wrong type, missing or unknown
 * field) or RangeError (value out of range, broken reference) whose message starts with the
 * field's path, e.g. `devices[1].package.terms[0].tauS: must be greater than zero, got -1 s`.
 * With a cache, a raw profile object met before with the same raw devices and rail-plan
 * presence (all its parse depends on) is not read again, nor is a raw profile item (segment
 * or group) met before in such a profile.
 */
export function parseStudy(json: unknown, cache?: ParseCache): StudyDocument {
  const root = asObject(json, '');
  const rawProfile = root.profile;
  const known = cache && rawProfile !== null && typeof rawProfile === 'object' ? cache.profiles.get(rawProfile) : undefined;
  const format = readString(root, 'format', '');
  if (format !== STUDY_FORMAT) rangeFail('format', `must be "${STUDY_FORMAT}", got ${JSON.stringify(format)}`);
  if (root.version === undefined) typeFail('version', 'is required');
  if (root.version !== STUDY_VERSION) {
    rangeFail('version', `must be ${STUDY_VERSION} (the only version this program reads), got ${JSON.stringify(root.version)}`);
  }
  // A known profile or profile item was finite when it was parsed (and is not changed in place).
  const nonFinite = known ? findNonFinite(withoutProfile(root)) : findNonFinite(root, '', 0, cache ? (v) => cache.items.has(v) : undefined);
  if (nonFinite !== undefined) rangeFail(nonFinite, 'must be a finite number, got NaN or Infinity');
  onlyKeys(root, TOP_KEYS, '');

  const title = readString(root, 'title', '').trim();
  if (title === '') rangeFail('title', 'must not be empty');
  const description = readOptionalString(root, 'description', '') ?? '';
  readOptionalString(root, 'notes', '');
  const mainsFed = readOptionalBoolean(root, 'mainsFed', '');
  const marginK = readOptionalNumber(root, 'marginK', '', { min: 0, unit: 'K' }) ?? DEFAULT_MARGIN_K;
  const ambient = parseAmbient(root.ambient, 'ambient');
  const enclosure = root.enclosure === undefined ? undefined : parseEnclosure(root.enclosure, 'enclosure');

  const sinks = asArray(root.sinks, 'sinks', 1).map((item, i) => parseSink(item, fieldPath('sinks', i), enclosure !== undefined));
  const devices = asArray(root.devices, 'devices', 1).map((item, i) => parseDevice(item, fieldPath('devices', i)));
  const taken = new Map<string, string>();
  checkUniqueIds(sinks, 'sinks', taken);
  checkUniqueIds(devices, 'devices', taken);
  checkSinkPaths(sinks, enclosure !== undefined);
  checkDeviceSinks(devices, sinks);

  const railPlan = root.railPlan === undefined ? undefined : parseRailPlan(root.railPlan, 'railPlan', devices);
  const context = cache ? JSON.stringify([root.devices, railPlan !== undefined]) : '';
  let profile: Profile;
  if (known && known.context === context) profile = known.profile;
  else {
    profile = parseProfile(root.profile, 'profile', devices, railPlan !== undefined, cache ? { items: cache.items, context } : undefined);
    if (cache && rawProfile !== null && typeof rawProfile === 'object') cache.profiles.set(rawProfile, { context, profile });
  }
  const doc: StudyDocument = { format: STUDY_FORMAT, version: STUDY_VERSION, title, description, marginK, ambient, sinks, devices, profile };
  if (mainsFed !== undefined) doc.mainsFed = mainsFed;
  if (enclosure) doc.enclosure = enclosure;
  if (railPlan) doc.railPlan = railPlan;
  if (root.site !== undefined) doc.site = parseSite(root.site, 'site');
  if (root.lifetime !== undefined) doc.lifetime = parseLifetime(root.lifetime, 'lifetime', profile.periodic);
  if (root.touch !== undefined) doc.touch = parseTouch(root.touch, 'touch', sinks);
  return doc;
}
