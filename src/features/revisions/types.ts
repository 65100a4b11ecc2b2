import type { StudyAuthor } from '@/features/studies/types';

export type RevisionReviewMark = { decision: 'approved' | 'changes_requested'; reviewer: string | null; at: string };

/** One entry of `GET /api/studies/:id/revisions` (newest first). */
export type RevisionSummary = {
  number: number;
  title: string;
  author: StudyAuthor | null;
  createdAt: string;
  changeCount: number;
  /** Readable lines of what changed since the revision before, at most a dozen. */
  summary: string[];
  reviews: RevisionReviewMark[];
};

export type FieldChange =
  | { kind: 'changed'; path: string; before: unknown; after: unknown }
  | { kind: 'added'; path: string; after: unknown }
  | { kind: 'removed'; path: string; before: unknown };

/** Body of `GET /api/studies/:id/revisions/:number`. */
export type RevisionView = {
  revision: {
    number: number;
    title: string;
    description: string;
    document: unknown;
    author: StudyAuthor | null;
    createdAt: string;
  };
  /** Version number of the current study. */
  current: number;
  changesToCurrent: FieldChange[];
  summaryToCurrent: string[];
};
