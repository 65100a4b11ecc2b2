import {
  DEFAULT_ARRHENIUS_EV,
  LESIT_MODEL,
  MIN_SITE_ALTITUDE_M,
  TOUCH_CONTACTS,
  TOUCH_MATERIALS,
  standardAtmosphere,
  touchLimitC,
  type Mission,
  type TouchContact,
  type TouchMaterial,
} from '../reliability';
import type { Sink } from './types';
import type { StudyLifetime, StudySite, StudyTouch, TouchRule } from './reliability-types';
import { asObject, fieldPath, onlyKeys, rangeFail, readNumber, readOptionalBoolean, readOptionalNumber, readOptionalString, typeFail, type Obj } from './field-reader';

const CELSIUS = { min: -273.15, exclusive: true, unit: '°C' };
/** Above this share of radiation the convective derating would mean little (and 1 would divide by zero). */
const MAX_RADIATION_SHARE = 0.9;

/** Reads `site`: `{ altitudeM, radiationShare? }`. */
export function parseSite(value: unknown, path: string): StudySite {
  const obj = asObject(value, path);
  onlyKeys(obj, ['altitudeM', 'radiationShare', 'notes'], path);
  readOptionalString(obj, 'notes', path);
  const altitudeM = readNumber(obj, 'altitudeM', path, { min: MIN_SITE_ALTITUDE_M, unit: 'm' });
  try {
    standardAtmosphere(altitudeM);
  } catch {
    rangeFail(fieldPath(path, 'altitudeM'), `must be at most about 11,000 m (the standard atmosphere's troposphere), got ${altitudeM} m`);
  }
  const radiationShare = readOptionalNumber(obj, 'radiationShare', path, { min: 0, max: MAX_RADIATION_SHARE }) ?? 0;
  return { altitudeM, radiationShare };
}

function parseMission(value: unknown, path: string): Mission {
  const obj = asObject(value, path);
  onlyKeys(obj, ['hoursPerDay', 'repeatsPerDay', 'startsPerDay'], path);
  if (obj.hoursPerDay !== undefined && obj.repeatsPerDay !== undefined) typeFail(fieldPath(path, 'repeatsPerDay'), 'give either hoursPerDay or repeatsPerDay, not both');
  if (obj.repeatsPerDay !== undefined) return { kind: 'repeats', repeatsPerDay: readNumber(obj, 'repeatsPerDay', path, { min: 0 }) };
  if (obj.hoursPerDay === undefined) typeFail(fieldPath(path, 'hoursPerDay'), 'is required (or give repeatsPerDay)');
  return { kind: 'hours', hoursPerDay: readNumber(obj, 'hoursPerDay', path, { min: 0, max: 24, unit: 'h' }) };
}

/** Reads `lifetime`: `{ mission, powerCycling?, arrhenius? }`; `periodic` is the profile's, when there is one. */
export function parseLifetime(value: unknown, path: string, periodic?: boolean): StudyLifetime {
  const obj = asObject(value, path);
  onlyKeys(obj, ['mission', 'powerCycling', 'arrhenius', 'notes'], path);
  readOptionalString(obj, 'notes', path);
  const missionPath = fieldPath(path, 'mission');
  const mission = parseMission(obj.mission, missionPath);
  const startsPerDay = readOptionalNumber(obj.mission as Obj, 'startsPerDay', missionPath, { min: 0 }) ?? 0;
  if (startsPerDay > 0 && periodic === false) {
    rangeFail(fieldPath(missionPath, 'startsPerDay'), 'only for a periodic profile (a run that is not periodic already starts from the ambient)');
  }
  let powerCycling = { ...LESIT_MODEL };
  if (obj.powerCycling !== undefined) {
    const p = fieldPath(path, 'powerCycling');
    const pc = asObject(obj.powerCycling, p);
    onlyKeys(pc, ['coefficient', 'exponent', 'activationEnergyEV'], p);
    powerCycling = {
      coefficient: readOptionalNumber(pc, 'coefficient', p, { min: 0, exclusive: true }) ?? LESIT_MODEL.coefficient,
      exponent: readOptionalNumber(pc, 'exponent', p, { min: 0, exclusive: true, max: 20 }) ?? LESIT_MODEL.exponent,
      activationEnergyEV: readOptionalNumber(pc, 'activationEnergyEV', p, { min: 0, max: 5, unit: 'eV' }) ?? LESIT_MODEL.activationEnergyEV,
    };
  }
  const result: StudyLifetime = { powerCycling, mission, startsPerDay };
  if (obj.arrhenius !== undefined) {
    const p = fieldPath(path, 'arrhenius');
    const a = asObject(obj.arrhenius, p);
    onlyKeys(a, ['referenceC', 'activationEnergyEV'], p);
    result.arrhenius = {
      referenceC: readNumber(a, 'referenceC', p, CELSIUS),
      activationEnergyEV: readOptionalNumber(a, 'activationEnergyEV', p, { min: 0, max: 5, unit: 'eV' }) ?? DEFAULT_ARRHENIUS_EV,
    };
  }
  return result;
}

function readChoice<T extends string>(obj: Obj, key: string, path: string, choices: readonly T[]): T | undefined {
  const value = readOptionalString(obj, key, path);
  if (value !== undefined && !choices.includes(value as T)) rangeFail(fieldPath(path, key), `must be one of ${choices.join(', ')}, got ${JSON.stringify(value)}`);
  return value as T | undefined;
}

/** One touch rule (top level or per sink) over the rule it inherits. */
function readRule(obj: Obj, path: string, inherited: TouchRule): TouchRule {
  const limitC = readOptionalNumber(obj, 'limitC', path, CELSIUS);
  const material = readChoice<TouchMaterial>(obj, 'material', path, TOUCH_MATERIALS);
  const contact = readChoice<TouchContact>(obj, 'contact', path, TOUCH_CONTACTS);
  const accessible = readOptionalBoolean(obj, 'accessible', path) ?? inherited.accessible;
  if (limitC !== undefined) {
    if (material !== undefined) typeFail(fieldPath(path, 'material'), 'give either limitC or material and contact, not both');
    if (contact !== undefined) typeFail(fieldPath(path, 'contact'), 'give either limitC or material and contact, not both');
    return { accessible, limitC };
  }
  if (material === undefined && contact === undefined) return { ...inherited, accessible };
  const m = material ?? inherited.material ?? 'metal';
  const c = contact ?? inherited.contact ?? 'brief';
  return { accessible, limitC: touchLimitC(m, c), material: m, contact: c };
}

/**
 * Reads `touch`: `{ limitC? | material?, contact?, sinks?: { <sink id>: { limitC? | material?,
 * contact?, accessible? } } }`. Without a limit: bare metal, brief contact.
 */
export function parseTouch(value: unknown, path: string, sinks: Sink[]): StudyTouch {
  const obj = asObject(value, path);
  const keys = ['limitC', 'material', 'contact', 'accessible'];
  onlyKeys(obj, [...keys, 'sinks', 'notes'], path);
  readOptionalString(obj, 'notes', path);
  const base = readRule(obj, path, { accessible: true, limitC: touchLimitC('metal', 'brief'), material: 'metal', contact: 'brief' });
  const out: StudyTouch = { sinks: {} };
  for (const s of sinks) out.sinks[s.id] = base;
  if (obj.sinks !== undefined) {
    const p = fieldPath(path, 'sinks');
    const bySink = asObject(obj.sinks, p);
    for (const [id, raw] of Object.entries(bySink)) {
      const sp = fieldPath(p, id);
      if (!(id in out.sinks)) rangeFail(sp, `no sink has the id ${JSON.stringify(id)} (sinks: ${sinks.map((s) => s.id).join(', ')})`);
      const entry = asObject(raw, sp);
      onlyKeys(entry, keys, sp);
      out.sinks[id] = readRule(entry, sp, base);
    }
  }
  return out;
}
