import { parseQuantity } from '@/core/units';
import { toleranceSchema, type ToleranceInput } from '@/validation/tolerance';
import { schemaErrors } from '@/features/catalogues/form-values';

/** The spreads as typed: percentages ("10", "10 %", "±10 %"), ambient shifts in K, runs, seed. */
export type ToleranceFormValues = {
  mode: 'corners' | 'monte-carlo';
  rthJcPct: string;
  rthSaPct: string;
  interfacePct: string;
  ambientLowK: string;
  ambientHighK: string;
  linePct: string;
  loadPct: string;
  sharePct: string;
  runs: string;
  seed: string;
  datasheet: 'normal' | 'uniform';
};

export const PERCENT_FIELDS = ['rthJcPct', 'rthSaPct', 'interfacePct', 'linePct', 'loadPct', 'sharePct'] as const;
export const SHIFT_FIELDS = ['ambientLowK', 'ambientHighK'] as const;

/** Spreads a datasheet and a site commonly have (demo values, to be replaced by the study's own). */
export const initialToleranceValues = (): ToleranceFormValues => ({
  mode: 'monte-carlo',
  rthJcPct: '10',
  rthSaPct: '15',
  interfacePct: '20',
  ambientLowK: '-5',
  ambientHighK: '10',
  linePct: '10',
  loadPct: '5',
  sharePct: '10',
  runs: '1000',
  seed: '1',
  datasheet: 'normal',
});

type Read = { ok: true; value: number } | { ok: false; reason: string };

function readPercent(text: string): Read {
  const t = text.trim().replace(/^±/, '').replace(/\s*%$/, '');
  if (t === '') return { ok: true, value: 0 };
  const v = Number(t.replace(',', '.'));
  return Number.isFinite(v) && /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/.test(t) ? { ok: true, value: v } : { ok: false, reason: `"${text.trim()}" is not a percentage` };
}

function readShift(text: string): Read {
  if (text.trim() === '') return { ok: true, value: 0 };
  // "−5" typed with a minus sign reads as "-5".
  return parseQuantity(text.replace('−', '-'), 'temperatureDifference');
}

function readWhole(text: string): Read {
  const t = text.trim().replace(/[,_\s]/g, '');
  if (t === '') return { ok: false, reason: 'is empty' };
  const v = Number(t);
  return Number.isFinite(v) ? { ok: true, value: v } : { ok: false, reason: `"${text.trim()}" is not a number` };
}

/** Reads the typed values: the request body, or the reasons the text does not read, by field. */
export function readToleranceForm(v: ToleranceFormValues): { input: ToleranceInput | null; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const body: Record<string, unknown> = { mode: v.mode };
  const take = (key: keyof ToleranceFormValues, read: (t: string) => Read) => {
    const r = read(v[key]);
    if (r.ok) body[key] = r.value;
    else errors[key] = r.reason;
  };
  PERCENT_FIELDS.forEach((k) => take(k, readPercent));
  SHIFT_FIELDS.forEach((k) => take(k, readShift));
  if (v.mode === 'monte-carlo') {
    take('runs', readWhole);
    take('seed', readWhole);
    const d = v.datasheet;
    body.distributions = { rthJc: d, rthSa: d, interface: d, share: d, ambient: 'uniform', line: 'uniform', load: 'uniform' };
  }
  Object.assign(errors, Object.fromEntries(Object.entries(schemaErrors(toleranceSchema, body)).filter(([k]) => !(k in errors))));
  return { input: Object.keys(errors).length ? null : (toleranceSchema.cast(body) as ToleranceInput), errors };
}
