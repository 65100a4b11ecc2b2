import { ValidationError, type AnyObjectSchema } from 'yup';

/** A form's text as a number: empty → null, a comma accepted as the decimal mark, anything else NaN (the schema names it). */
export function numberOrNull(text: string): number | null {
  const t = text.trim();
  if (t === '') return null;
  return Number(t.replace(',', '.'));
}

/** A number shown in a form field; null or undefined as empty. */
export const textOf = (value: number | null | undefined): string => (value === null || value === undefined ? '' : String(value));

/**
 * Every problem the shared schema finds, keyed by field path ("forcedAir[1].rthKPerW"), first
 * message per path: the same checks and wording the server applies.
 */
export function schemaErrors(schema: AnyObjectSchema, input: unknown): Record<string, string> {
  try {
    schema.validateSync(input, { abortEarly: false });
    return {};
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    const out: Record<string, string> = {};
    for (const e of error.inner.length ? error.inner : [error]) {
      const path = e.path ?? '';
      if (!(path in out)) out[path] = e.message;
    }
    return out;
  }
}
