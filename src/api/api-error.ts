import { isAxiosError } from 'axios';

export type ApiErrorDetail = { path: string; message: string };

export type ApiErrorBody = {
  error: { code: string; message?: string; details?: ApiErrorDetail[] };
};

const FALLBACK_MESSAGE = 'Something went wrong. Please try again.';
const NETWORK_MESSAGE = 'The server could not be reached. Check the connection and try again.';

function errorBody(error: unknown): ApiErrorBody['error'] | undefined {
  if (!isAxiosError(error)) return undefined;
  const data: unknown = error.response?.data;
  if (typeof data !== 'object' || data === null || !('error' in data)) return undefined;
  const body = (data as { error: unknown }).error;
  if (typeof body !== 'object' || body === null || typeof (body as { code?: unknown }).code !== 'string') {
    return undefined;
  }
  return body as ApiErrorBody['error'];
}

/** HTTP status of a failed request, or undefined when no response arrived. */
export function errorStatus(error: unknown): number | undefined {
  return isAxiosError(error) ? error.response?.status : undefined;
}

/** Machine-readable code from the `{ error: { code } }` body, if any. */
export function errorCode(error: unknown): string | undefined {
  return errorBody(error)?.code;
}

/** A sentence to show the user for any failure, preferring the server's own message. */
export function errorMessage(error: unknown): string {
  const body = errorBody(error);
  if (body?.message) return body.message;
  if (isAxiosError(error) && !error.response) return NETWORK_MESSAGE;
  return FALLBACK_MESSAGE;
}

/** Field-level messages from a 400 `details` list, keyed by field path (first message wins). */
export function fieldErrors(error: unknown): Record<string, string> {
  const details = errorBody(error)?.details ?? [];
  const result: Record<string, string> = {};
  for (const detail of details) {
    if (detail && typeof detail.path === 'string' && !(detail.path in result)) {
      result[detail.path] = detail.message;
    }
  }
  return result;
}
