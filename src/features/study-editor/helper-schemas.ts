import * as yup from 'yup';

import type { UnitKind } from '@/core/units';

import { readText } from './quantity-text';

type Rule = { min?: number; above?: number; integer?: boolean; max?: number };

/** A quantity typed as text ("200 ms"), checked with the same reader as the editor's fields. */
export function quantityText(kind: UnitKind | 'integer', rule: Rule = {}) {
  return yup.string().test('quantity', '', function (text) {
    const read = readText(text ?? '', kind);
    if (!read.ok) return this.createError({ message: read.reason });
    const v = read.value;
    if (rule.above !== undefined && !(v > rule.above)) return this.createError({ message: `must be greater than ${rule.above}` });
    if (rule.min !== undefined && v < rule.min) return this.createError({ message: `must be at least ${rule.min}` });
    if (rule.max !== undefined && v > rule.max) return this.createError({ message: `must be at most ${rule.max.toLocaleString('en')}` });
    return true;
  });
}

/** Reads a text the schema has accepted. */
export function valueOf(text: string, kind: UnitKind | 'integer'): number {
  const read = readText(text, kind);
  if (!read.ok) throw new RangeError(read.reason);
  return read.value;
}

/** Formik errors from a yup schema: every message, keyed by field. */
export function schemaErrors(schema: yup.AnyObjectSchema, values: unknown): Record<string, string> {
  try {
    schema.validateSync(values, { abortEarly: false });
    return {};
  } catch (error) {
    if (!(error instanceof yup.ValidationError)) throw error;
    const out: Record<string, string> = {};
    for (const e of error.inner) if (e.path && !(e.path in out)) out[e.path] = e.message;
    return out;
  }
}

/** What the helpers' levels are: load current (with Vin and Vout held) or one device's power. */
export type TargetValues = { target: string; vin: string; vout: string };

export const targetSchema = (railPlan: boolean) => ({
  vin: yup.string().when('target', { is: 'current', then: () => (railPlan ? yup.string() : quantityText('voltage', { min: 0 })) }),
  vout: yup.string().when('target', { is: 'current', then: () => quantityText('voltage', { min: 0 }) }),
});
