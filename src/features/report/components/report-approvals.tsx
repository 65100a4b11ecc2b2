import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { useReviews } from '@/features/review/api';
import type { Review } from '@/features/review/types';
import { formatDateTime } from '@/features/studies/format';
import type { Study } from '@/features/studies/types';

import { approvalSummary } from '../approval-summary';
import { ReportSection } from './report-section';
import { ReportTable, type ReportColumn } from './report-table';

const DECISIONS = { approved: 'approved', changes_requested: 'changes requested' } as const;

const COLUMNS: readonly ReportColumn<Review>[] = [
  { label: 'Revision', cell: (r) => `Revision ${r.revision}`, flex: 0.8 },
  { label: 'Decision', cell: (r) => DECISIONS[r.decision], flex: 1 },
  { label: 'By', cell: (r) => r.reviewer?.name ?? 'a former member', flex: 1 },
  { label: 'When', cell: (r) => formatDateTime(r.createdAt), flex: 1.1 },
  { label: 'Comment', cell: (r) => r.comment || '—', flex: 2 },
];

export type ReportApprovalsProps = { study: Study };

/** Which revision was approved, by whom and when; a clear mark when the revision shown is not it. */
export function ReportApprovals({ study }: ReportApprovalsProps) {
  const reviews = useReviews(study.id);
  const summary = approvalSummary(study, reviews.data ?? []);
  return (
    <ReportSection name="approvals" title="Approval">
      <View testID="report-approval" style={[styles.box, summary.currentApproved ? styles.approved : styles.open]}>
        <Text variant="heading">{summary.line}</Text>
        {summary.warning ? (
          <Text testID="report-not-approved" variant="bodyStrong" style={styles.warning}>
            {`Not approved: ${summary.warning}`}
          </Text>
        ) : (
          <Text tone="muted">This report shows the approved revision.</Text>
        )}
      </View>
      {reviews.isPending ? <Text tone="muted">Loading the review history…</Text> : null}
      {reviews.isError ? <Text tone="danger">{`The review history could not be loaded: ${errorMessage(reviews.error)}`}</Text> : null}
      {reviews.data && reviews.data.length > 0 ? (
        <ReportTable label="Review decisions" rows={[...reviews.data].reverse()} rowKey={(r) => String(r.id)} columns={COLUMNS} noun={['decision', 'decisions']} />
      ) : null}
      {reviews.data && reviews.data.length === 0 ? <Text tone="muted">No review decisions yet.</Text> : null}
    </ReportSection>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xs, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderLeftWidth: 4 },
  approved: { borderColor: color.success, backgroundColor: color.successSoft },
  open: { borderColor: color.warning, backgroundColor: color.warningSoft },
  warning: { color: color.warning },
});
