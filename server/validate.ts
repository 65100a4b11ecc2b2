import type { AnySchema, InferType } from 'yup';
import { ValidationError } from 'yup';
import { AppError, fromYup, type ErrorDetail } from './errors';

type Described = { type: string; fields?: Record<string, Described>; innerType?: Described };

const JSON_TYPE: Record<string, (v: unknown) => boolean> = {
  string: (v) => typeof v === 'string',
  number: (v) => typeof v === 'number',
  boolean: (v) => typeof v === 'boolean',
  object: (v) => typeof v === 'object' && !Array.isArray(v),
  array: (v) => Array.isArray(v),
};
const NOUN: Record<string, string> = { string: 'text', number: 'a number', boolean: 'true or false', object: 'an object', array: 'a list' };

/**
 * yup casts ("42" → 42, 42 → "42") and its string transforms fail on arrays, so an API body is
 * first held to the JSON types the schema names: a wrong type is a 400 naming the field.
 */
function checkTypes(d: Described, value: unknown, path: string, out: ErrorDetail[]) {
  if (value === undefined || value === null) return;
  const ok = JSON_TYPE[d.type];
  if (ok && !ok(value)) {
    out.push({ path: path || '(body)', message: `must be ${NOUN[d.type]}` });
    return;
  }
  // PostgreSQL text cannot hold U+0000 (the driver would store the two characters "\0"
  // instead); refused on SQLite too, so both store what was typed or answer the same 400.
  if (typeof value === 'string' && value.includes('\u0000')) {
    out.push({ path: path || '(body)', message: 'must not contain the NUL character (U+0000)' });
    return;
  }
  if (d.type === 'object' && d.fields) {
    for (const [key, field] of Object.entries(d.fields)) checkTypes(field, (value as Record<string, unknown>)[key], path ? `${path}.${key}` : key, out);
  }
  if (d.type === 'array' && d.innerType) (value as unknown[]).forEach((v, i) => checkTypes(d.innerType!, v, `${path}[${i}]`, out));
}

export function typeErrors(schema: AnySchema, body: unknown): ErrorDetail[] {
  const out: ErrorDetail[] = [];
  checkTypes(schema.describe() as Described, body, '', out);
  return out;
}

/** Validates a request body with a shared yup schema; throws a 400 naming every bad field. */
export function validateBody<S extends AnySchema>(schema: S, body: unknown): InferType<S> {
  if (body === undefined || body === null || typeof body !== 'object' || Array.isArray(body)) {
    throw AppError.badRequest('Request body must be a JSON object', [{ path: '(body)', message: 'must be a JSON object' }]);
  }
  const wrong = typeErrors(schema, body);
  if (wrong.length) throw AppError.badRequest(wrong.map((w) => `${w.path}: ${w.message}`).join('; '), wrong);
  try {
    return schema.validateSync(body, { abortEarly: false, stripUnknown: false });
  } catch (err) {
    if (err instanceof ValidationError) throw fromYup(err);
    throw err;
  }
}
