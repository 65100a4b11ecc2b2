import type { StudyAuthor } from '@/features/studies/types';

export type ReviewDecision = 'approved' | 'changes_requested';

/** One decision of `GET /api/studies/:id/reviews` (oldest first). */
export type Review = {
  id: number;
  revision: number;
  decision: ReviewDecision;
  comment: string;
  reviewer: StudyAuthor | null;
  createdAt: string;
};
