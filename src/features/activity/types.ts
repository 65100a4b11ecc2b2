/** One entry of `GET /api/teams/:teamId/activity`; `details` depends on the action. */
export type ActivityEvent = {
  id: number;
  action: string;
  actor: { id: number; name: string } | null;
  subjectType: string | null;
  subjectId: number | null;
  details: Record<string, unknown> | null;
  createdAt: string;
};
