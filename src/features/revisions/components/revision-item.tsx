import { StyleSheet, View } from 'react-native';

import { PressableLink, Text } from '@/components/ui';
import { color, fontSize, radius, spacing } from '@/constants/theme';
import { formatDateTime } from '@/features/studies/format';

import type { RevisionSummary } from '../types';

export type RevisionItemProps = { studyId: number; revision: RevisionSummary; isCurrent: boolean };

const MARK = { approved: 'Approved', changes_requested: 'Changes requested' } as const;

/** One revision: who saved it, when, what changed, and the review decisions given on it. */
export function RevisionItem({ studyId, revision, isCurrent }: RevisionItemProps) {
  const hidden = revision.changeCount - revision.summary.length;
  return (
    <View testID={`revision-${revision.number}`} style={styles.item}>
      <View style={styles.head}>
        <Text variant="bodyStrong">
          Revision {revision.number}
          {isCurrent ? <Text tone="accent"> · current</Text> : null}
        </Text>
        <PressableLink
          href={`/studies/${studyId}/revisions/${revision.number}`}
          accessibilityLabel={`Open revision ${revision.number}`}
          style={styles.open}
          activeStyle={styles.openActive}
        >
          <Text variant="label" tone="accent">
            {isCurrent ? 'Open' : 'Open and compare'}
          </Text>
        </PressableLink>
      </View>
      <Text variant="caption" tone="muted">
        {revision.author?.name ?? 'A former member'} · {formatDateTime(revision.createdAt)}
      </Text>
      <View style={styles.summary}>
        {revision.number === 1 ? (
          <Text variant="caption" tone="muted">
            First revision: the study as created.
          </Text>
        ) : revision.changeCount === 0 ? (
          <Text variant="caption" tone="muted">
            Saved without changes.
          </Text>
        ) : (
          revision.summary.map((line) => (
            <Text key={line} variant="mono" tone="muted" style={styles.line}>
              {line}
            </Text>
          ))
        )}
        {hidden > 0 ? (
          <Text variant="caption" tone="faint">
            and {hidden} more {hidden === 1 ? 'change' : 'changes'}
          </Text>
        ) : null}
      </View>
      {revision.reviews.map((mark) => (
        <Text key={`${mark.decision}-${mark.at}`} variant="caption" style={mark.decision === 'approved' ? styles.approved : styles.sentBack}>
          {MARK[mark.decision]} by {mark.reviewer ?? 'a former member'}, {formatDateTime(mark.at)}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  item: { gap: spacing.xxs, paddingVertical: spacing.md },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: spacing.md },
  open: { paddingHorizontal: spacing.sm, paddingVertical: spacing.xs, marginRight: -spacing.sm, borderRadius: radius.sm },
  openActive: { backgroundColor: color.surfaceMuted },
  summary: { gap: spacing.xxs, marginTop: spacing.xs },
  line: { fontSize: fontSize.xs },
  approved: { color: color.success },
  sentBack: { color: color.warning },
});
