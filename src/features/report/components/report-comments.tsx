import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Icon, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import { anchorLabel } from '@/features/comments/anchor-label';
import { useComments } from '@/features/comments/api';
import { formatDateTime } from '@/features/studies/format';

import { ReportSection } from './report-section';

export type ReportCommentsProps = { studyId: number };

/** Every comment on the study with its pin, as an appendix. */
export function ReportComments({ studyId }: ReportCommentsProps) {
  const comments = useComments(studyId);
  return (
    <ReportSection name="comments" title="Appendix: comments">
      {comments.isPending ? <Text tone="muted">Loading the comments…</Text> : null}
      {comments.isError ? <Text tone="danger">{`The comments could not be loaded: ${errorMessage(comments.error)}`}</Text> : null}
      {comments.data?.length === 0 ? <Text tone="muted">No comments on this study.</Text> : null}
      {comments.data?.map((comment) => (
        <View key={comment.id} testID={`report-comment-${comment.id}`} style={styles.item}>
          <Text variant="caption" tone="muted">
            <Text variant="label">{comment.author?.name ?? 'A former member'}</Text>
            {` · ${formatDateTime(comment.createdAt)} · revision ${comment.revision}`}
          </Text>
          {comment.anchor ? (
            <View style={styles.pin}>
              <Icon name="pin" size={14} color={color.accent} />
              <Text variant="label" tone="accent">
                {`Pinned ${anchorLabel(comment.anchor)}`}
              </Text>
            </View>
          ) : null}
          <Text>{comment.body}</Text>
        </View>
      ))}
    </ReportSection>
  );
}

const styles = StyleSheet.create({
  item: { gap: spacing.xxs, paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: color.border },
  pin: { flexDirection: 'row', alignItems: 'center', gap: spacing.xxs },
});
