import type { StudyAuthor } from '@/features/studies/types';

/** Where a comment is pinned on the results: a time on the heat curves or a point of the SOA chart. */
export type CommentAnchor = { kind: 'time'; timeS: number } | { kind: 'soa'; vceV: number; icA: number };

/** One entry of `GET /api/studies/:id/comments` (oldest first). */
export type StudyComment = {
  id: number;
  body: string;
  anchor: CommentAnchor | null;
  revision: number;
  author: StudyAuthor | null;
  createdAt: string;
};
