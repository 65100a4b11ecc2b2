import type { Study } from '@/features/studies/types';
import { formatDateTime } from '@/features/studies/format';

import type { Review } from './types';

export type ReviewCopy = { headline: string; detail: string };

export type ReviewViewer = { canEdit: boolean; canDecide: boolean; wroteCurrentRevision: boolean; isReviewer: boolean };

/** The newest decision on a revision, if any. */
export function latestReviewOn(reviews: readonly Review[], revision: number): Review | undefined {
  return [...reviews].reverse().find((review) => review.revision === revision);
}

/** What the banner says for this status and this viewer. */
export function reviewCopy(study: Study, reviews: readonly Review[], viewer: ReviewViewer): ReviewCopy {
  switch (study.status) {
    case 'draft':
      return {
        headline: 'Not yet submitted for review',
        detail: viewer.canEdit
          ? "When the design is ready, submit it: the team's reviewers are told by e-mail."
          : 'Its author submits it for review when it is ready.',
      };
    case 'in_review':
      return {
        headline: `Revision ${study.version} is waiting for a review`,
        detail: viewer.canDecide
          ? 'Approve it, or ask for changes and say what should change.'
          : viewer.isReviewer && viewer.wroteCurrentRevision
            ? 'You saved this revision, so another reviewer or owner decides on it.'
            : 'A reviewer or owner of the team decides on it next.',
      };
    case 'changes_requested': {
      const review = latestReviewOn(reviews, study.version);
      const asked = review ? `${review.reviewer?.name ?? 'A reviewer'} asked for changes.` : '';
      const next = viewer.canEdit ? ' Change the study, or submit it again as it is.' : '';
      return { headline: `Changes requested on revision ${study.version}`, detail: `${asked}${next}`.trim() };
    }
    case 'approved': {
      const approval = study.approval;
      if (!approval) return { headline: 'This study is approved', detail: '' };
      const by = approval.reviewer?.name ?? 'a former member';
      return {
        headline: `Revision ${approval.revision} approved`,
        detail: `By ${by}, ${formatDateTime(approval.at)}. A later change starts a new draft revision; this approval stays with revision ${approval.revision}.`,
      };
    }
  }
}
