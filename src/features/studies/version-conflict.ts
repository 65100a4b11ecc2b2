import { isAxiosError } from 'axios';

import { errorCode, errorStatus } from '@/api';

import type { Study } from './types';

/**
 * The server's current study when a save was refused because someone saved first
 * (409 `version_conflict` with `current`), or null for any other failure.
 */
export function conflictingStudy(error: unknown): Study | null {
  if (errorStatus(error) !== 409 || errorCode(error) !== 'version_conflict' || !isAxiosError(error)) return null;
  const current: unknown = (error.response?.data as { current?: unknown } | undefined)?.current;
  if (typeof current !== 'object' || current === null) return null;
  return typeof (current as { version?: unknown }).version === 'number' ? (current as Study) : null;
}
