import { api } from '@/api';
import type { ToleranceResult } from '@/core/tolerance';
import type { ToleranceInput } from '@/validation/tolerance';

export type ToleranceResponse = { version: number; result: ToleranceResult };

/** `POST /api/studies/:id/tolerance`: the sweep on the server's worker pool. */
export async function sweepOnServer(studyId: number, input: ToleranceInput): Promise<ToleranceResult> {
  return (await api.post<ToleranceResponse>(`/studies/${studyId}/tolerance`, input)).data.result;
}
