import { create } from 'axios';

/**
 * Base URL of the JSON API. `EXPO_PUBLIC_API_URL` is the full API root
 * (for example `http://localhost:8080/api`) when the web app is served from
 * another origin, such as Expo's dev server; otherwise the API is on the same
 * origin under `/api`.
 */
export const apiBaseUrl = (process.env.EXPO_PUBLIC_API_URL ?? '/api').replace(/\/+$/, '');

/** The one HTTP client. The session lives in an httpOnly cookie, so send credentials. */
export const api = create({
  baseURL: apiBaseUrl,
  withCredentials: true,
  headers: { Accept: 'application/json' },
  timeout: 20_000,
});
