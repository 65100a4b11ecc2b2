import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ValidationError as YupValidationError } from 'yup';

export type ErrorDetail = { path: string; message: string };

/** The one error type handlers throw; the error middleware turns it into JSON. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: ErrorDetail[],
    /** Extra top-level fields of the error body, e.g. the current study on a save conflict. */
    readonly extra?: Record<string, unknown>,
  ) {
    super(message);
    this.name = 'AppError';
  }

  static badRequest(message: string, details?: ErrorDetail[]) {
    return new AppError(400, 'validation_failed', message, details);
  }
  static unauthenticated(message = 'Sign in to continue') {
    return new AppError(401, 'unauthenticated', message);
  }
  static forbidden(message = 'Your role does not allow this') {
    return new AppError(403, 'forbidden', message);
  }
  static notFound(what = 'Resource') {
    return new AppError(404, 'not_found', `${what} not found`);
  }
}

export function fromYup(err: YupValidationError): AppError {
  const inner = err.inner.length > 0 ? err.inner : [err];
  const seen = new Set<string>();
  const details = inner.map((e) => ({ path: e.path || '(body)', message: e.message })).filter((d) => !seen.has(d.path) && seen.add(d.path));
  const message = details.map((d) => `${d.path}: ${d.message}`).join('; ');
  return AppError.badRequest(message, details);
}

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `No route for ${req.method} ${req.path}`));
};

type HttpishError = Error & { status?: number; statusCode?: number; type?: string; expose?: boolean };

export const errorHandler: ErrorRequestHandler = (err: unknown, _req, res, _next) => {
  if (err instanceof AppError) {
    res.status(err.status).json({ error: { code: err.code, message: err.message, details: err.details }, ...err.extra });
    return;
  }
  if (err instanceof YupValidationError) {
    const app = fromYup(err);
    res.status(400).json({ error: { code: app.code, message: app.message, details: app.details } });
    return;
  }
  const e = err as HttpishError;
  const status = e?.status ?? e?.statusCode;
  // body-parser and friends raise client errors with a status and a safe message.
  if (status && status >= 400 && status < 500) {
    const code = e.type === 'entity.parse.failed' ? 'malformed_json' : e.type === 'entity.too.large' ? 'payload_too_large' : 'bad_request';
    const message = e.type === 'entity.parse.failed' ? 'Request body is not valid JSON' : e.message;
    res.status(status).json({ error: { code, message } });
    return;
  }
  console.error(err);
  res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server' } });
};
