import { isAxiosError } from 'axios';

import { errorCode, errorMessage } from '@/api';

import type { ImportRowError } from './types';

export type ImportFailure = { message: string; rows: ImportRowError[]; total?: number };

const isRowError = (d: unknown): d is ImportRowError =>
  typeof d === 'object' && d !== null && typeof (d as ImportRowError).row === 'number' && typeof (d as ImportRowError).message === 'string';

/**
 * What a refused upload says: the server's sentence, and for `import_failed` each problem with
 * its row and column (the server lists at most 200; its message counts them all).
 */
export function importFailure(error: unknown): ImportFailure {
  const message = errorMessage(error);
  if (errorCode(error) !== 'import_failed' || !isAxiosError(error)) return { message, rows: [] };
  const details: unknown = (error.response?.data as { error?: { details?: unknown } } | undefined)?.error?.details;
  const rows = Array.isArray(details)
    ? details.filter(isRowError).map((d) => ({ row: d.row, column: typeof d.column === 'string' ? d.column : '', message: d.message }))
    : [];
  const counted = /(\d+) problem/.exec(message);
  return { message, rows, total: counted ? Number(counted[1]) : undefined };
}
