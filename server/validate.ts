import type { AnySchema, InferType } from 'yup';
import { ValidationError } from 'yup';
import { AppError, fromYup } from './errors';

/** Validates a request body with a shared yup schema; throws a 400 naming every bad field. */
export function validateBody<S extends AnySchema>(schema: S, body: unknown): InferType<S> {
  if (body === undefined || body === null || typeof body !== 'object' || Array.isArray(body)) {
    throw AppError.badRequest('Request body must be a JSON object', [{ path: '(body)', message: 'must be a JSON object' }]);
  }
  try {
    return schema.validateSync(body, { abortEarly: false, stripUnknown: false });
  } catch (err) {
    if (err instanceof ValidationError) throw fromYup(err);
    throw err;
  }
}
