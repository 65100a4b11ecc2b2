import type { Review } from '@/features/review/types';
import { formatDateTime } from '@/features/studies/format';
import { STATUS_LABELS } from '@/features/studies/status';
import type { Study } from '@/features/studies/types';

export type ApprovalSummary = {
  /** "Revision 2 approved by Cy Reviewer on 3 May 2025, 10:00", or that none was. */
  line: string;
  /** Whether the revision this report shows is the approved one. */
  currentApproved: boolean;
  /** Said plainly when the revision shown is not the approved one. */
  warning: string | null;
};

const nameOf = (reviewer: { name: string } | null) => reviewer?.name ?? 'a former member';

/**
 * Which revision was approved, by whom and when: the approval in force while the study is
 * approved, otherwise the latest approval among the reviews (it stays with its revision when
 * a later edit starts a new draft).
 */
export function approvalSummary(study: Pick<Study, 'status' | 'version' | 'approval'>, reviews: readonly Review[]): ApprovalSummary {
  const latest = [...reviews].reverse().find((review) => review.decision === 'approved');
  const approval = study.approval
    ? { revision: study.approval.revision, by: nameOf(study.approval.reviewer), at: study.approval.at }
    : latest
      ? { revision: latest.revision, by: nameOf(latest.reviewer), at: latest.createdAt }
      : null;
  const currentApproved = study.status === 'approved' && approval?.revision === study.version;
  const status = STATUS_LABELS[study.status].toLowerCase();
  if (!approval) {
    return {
      line: 'No revision of this study has been approved.',
      currentApproved: false,
      warning: `Revision ${study.version}, shown in this report, is not approved (${status}).`,
    };
  }
  return {
    line: `Revision ${approval.revision} approved by ${approval.by} on ${formatDateTime(approval.at)}`,
    currentApproved,
    warning: currentApproved
      ? null
      : `Revision ${study.version}, shown in this report, is not the approved revision: it is ${status}${
          approval.revision < study.version ? `, saved after revision ${approval.revision} was approved` : ''
        }.`,
  };
}
