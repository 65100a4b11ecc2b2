import type { StudyStatus } from '@/validation';

export type { StudyStatus };

export type StudyAuthor = { id: number; name: string };

/** One row of `GET /api/studies`. */
export type StudySummary = {
  id: number;
  teamId: number;
  teamName: string;
  title: string;
  description: string;
  status: StudyStatus;
  version: number;
  author: StudyAuthor;
  createdAt: string;
  updatedAt: string;
};

/** Body of `GET /api/studies/:id`: the summary plus the saved design document. */
export type Study = StudySummary & { document: unknown };
