import { color } from '@/constants/theme';
import { STUDY_STATUSES, type StudyStatus } from '@/validation';

export const STATUS_LABELS: Record<StudyStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  changes_requested: 'Changes requested',
  approved: 'Approved',
};

/** Order of the review workflow, used when sorting by status. */
export const STATUS_ORDER: Record<StudyStatus, number> = Object.fromEntries(
  STUDY_STATUSES.map((status, index) => [status, index]),
) as Record<StudyStatus, number>;

export const STATUS_COLORS: Record<StudyStatus, { fg: string; bg: string }> = {
  draft: { fg: color.inkMuted, bg: color.surfaceMuted },
  in_review: { fg: color.info, bg: color.infoSoft },
  changes_requested: { fg: color.warning, bg: color.warningSoft },
  approved: { fg: color.success, bg: color.successSoft },
};
