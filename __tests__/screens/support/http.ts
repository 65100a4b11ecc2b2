import { AxiosError, AxiosHeaders, type AxiosResponse, type InternalAxiosRequestConfig } from 'axios';

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
type Handler = (body?: unknown) => Promise<unknown>;

/** A successful axios-style response with the given body. */
export function ok<T>(data: T, status = 200): Promise<{ data: T; status: number }> {
  return Promise.resolve({ data, status });
}

/** A rejected request shaped like axios's own error for an HTTP failure. */
export function httpError(status: number, data: unknown): Promise<never> {
  const config = { headers: new AxiosHeaders() } as InternalAxiosRequestConfig;
  const response = { status, statusText: String(status), data, headers: {}, config } as AxiosResponse;
  return Promise.reject(new AxiosError(`Request failed with status code ${status}`, 'ERR_BAD_RESPONSE', config, {}, response));
}

/**
 * Routes calls on the mocked `api` client to handlers keyed like "GET /studies".
 * An unexpected call fails the test loudly instead of hanging.
 */
export function routeApi(
  api: Partial<Record<Method, jest.Mock>>,
  handlers: Record<string, Handler>,
): void {
  for (const method of ['get', 'post', 'put', 'patch', 'delete'] as const) {
    // Mocks without put or patch keep working for screens that never send them.
    api[method]?.mockImplementation((url: string, body?: unknown) => {
      const handler = handlers[`${method.toUpperCase()} ${url}`];
      if (!handler) return Promise.reject(new Error(`Unexpected request ${method.toUpperCase()} ${url}`));
      return handler(body);
    });
  }
}
