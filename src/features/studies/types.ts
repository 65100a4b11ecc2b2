import type { DefaultSections } from '@/core/study';
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

/** The approval in force: which revision, by whom, when (only while the study is approved). */
export type Approval = { revision: number; reviewer: StudyAuthor | null; at: string };

/**
 * Body of `GET /api/studies/:id`: the summary plus the saved design document, and the team
 * defaults the study was started with (its first document takes them).
 */
export type Study = StudySummary & { document: unknown; approval?: Approval | null; teamDefaults?: DefaultSections | null };
