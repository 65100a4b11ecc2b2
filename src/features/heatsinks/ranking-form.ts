import type { SortKey } from '@/core/heatsink';
import { parseQuantity, type UnitKind } from '@/core/units';

import type { RankingQuery } from './ranking-types';

/** A sink slot of the study, as its document names it. */
export type StudySinkSlot = { id: string; name?: string; airSpeedMPerS?: number };

/** The what-ifs as typed. Empty ambient or margin keeps the study's own value. */
export type RankingFormState = {
  sink: string;
  sort: SortKey;
  air: 'still' | 'moving';
  speedText: string;
  ambientText: string;
  marginText: string;
};

export type RankingDefaults = { sinks: StudySinkSlot[]; ambientC: number | null; marginK: number };

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The sink slots, the highest ambient and the margin a saved study document gives. */
export function rankingDefaults(raw: unknown): RankingDefaults {
  const doc = isRecord(raw) ? raw : {};
  const sinks = (Array.isArray(doc.sinks) ? doc.sinks : []).filter(isRecord).flatMap((s): StudySinkSlot[] => {
    if (typeof s.id !== 'string') return [];
    const air = isRecord(s.forcedAir) && typeof s.forcedAir.airSpeedMPerS === 'number' ? s.forcedAir.airSpeedMPerS : undefined;
    return [{ id: s.id, ...(typeof s.name === 'string' ? { name: s.name } : {}), ...(air === undefined ? {} : { airSpeedMPerS: air }) }];
  });
  const ambient = isRecord(doc.ambient) ? doc.ambient : {};
  let ambientC: number | null = typeof ambient.temperatureC === 'number' ? ambient.temperatureC : null;
  if (ambientC === null && Array.isArray(ambient.profile)) {
    const temps = ambient.profile.filter(isRecord).map((p) => p.temperatureC).filter((t): t is number => typeof t === 'number');
    if (temps.length) ambientC = Math.max(...temps);
  }
  return { sinks, ambientC, marginK: typeof doc.marginK === 'number' ? doc.marginK : 20 };
}

/** The first sink slot, in the air the study gives it, sorted by mass. */
export function initialRankingForm(defaults: RankingDefaults): RankingFormState {
  const first = defaults.sinks[0];
  return {
    sink: first?.id ?? '',
    sort: 'mass',
    air: first?.airSpeedMPerS === undefined ? 'still' : 'moving',
    speedText: first?.airSpeedMPerS === undefined ? '' : String(first.airSpeedMPerS),
    ambientText: '',
    marginText: '',
  };
}

type Read = { ok: true; value: number | null } | { ok: false; reason: string };

function read(text: string, kind: UnitKind, optional: boolean): Read {
  if (text.trim() === '') return optional ? { ok: true, value: null } : { ok: false, reason: 'is empty' };
  const parsed = parseQuantity(text, kind);
  return parsed.ok ? { ok: true, value: parsed.value } : parsed;
}

export type RankingFormCheck = { query: RankingQuery | null; errors: Partial<Record<'speed' | 'ambient' | 'margin' | 'sink', string>> };

/** The query the form asks for, or the fields at fault and why. */
export function checkRankingForm(form: RankingFormState): RankingFormCheck {
  const errors: RankingFormCheck['errors'] = {};
  if (form.sink === '') errors.sink = 'Sink slot: the study has no sink to rank';
  let speed: number | null = null;
  if (form.air === 'moving') {
    const r = read(form.speedText, 'speed', false);
    if (!r.ok) errors.speed = `Air speed ${r.reason}`;
    else if (r.value === null || !(r.value > 0)) errors.speed = 'Air speed must be above 0 m/s (or choose still air)';
    else if (r.value > 50) errors.speed = 'Air speed above 50 m/s is not plausible';
    else speed = r.value;
  }
  const ambient = read(form.ambientText, 'temperature', true);
  if (!ambient.ok) errors.ambient = `Ambient ${ambient.reason}`;
  else if (ambient.value !== null && ambient.value <= -273.15) errors.ambient = 'Ambient must be above −273.15 °C';
  const margin = read(form.marginText, 'temperatureDifference', true);
  if (!margin.ok) errors.margin = `Margin ${margin.reason}`;
  else if (margin.value !== null && margin.value < 0) errors.margin = 'Margin cannot be negative';
  if (Object.keys(errors).length > 0) return { query: null, errors };
  return {
    query: {
      sink: form.sink,
      sort: form.sort,
      airSpeedMPerS: speed,
      ambientC: ambient.ok ? ambient.value : null,
      marginK: margin.ok ? margin.value : null,
    },
    errors,
  };
}
