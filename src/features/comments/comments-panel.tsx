import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Card, ErrorState, LoadingState, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import { useSignedInSession } from '@/features/auth/api';
import { membershipFor } from '@/features/studies/study-permissions';
import type { Study } from '@/features/studies/types';

import { useComments } from './api';
import { CommentForm } from './components/comment-form';
import { CommentItem } from './components/comment-item';
import type { CommentAnchor } from './types';

export type CommentsPanelProps = {
  study: Study;
  /**
   * A pin picked on a results chart (a time on the heat curves, a point of the SOA chart);
   * the next comment is attached to it. Without one, a comment may be pinned to a typed time.
   */
  anchor?: CommentAnchor | null;
  /** Told when the pin is removed or used by a posted comment. */
  onAnchorChange?: (anchor: CommentAnchor | null) => void;
  /** Lets a chart show the point a pinned comment refers to. */
  onAnchorPress?: (anchor: CommentAnchor) => void;
};

/** The study's discussion: every member comments; authors and owners delete. */
export function CommentsPanel({ study, anchor, onAnchorChange, onAnchorPress }: CommentsPanelProps) {
  const session = useSignedInSession();
  const comments = useComments(study.id);
  const isOwner = membershipFor(session, study)?.role === 'owner';

  return (
    <Card role="region" aria-label="Comments" style={styles.card}>
      <Text variant="heading">Comments{comments.data?.length ? ` (${comments.data.length})` : ''}</Text>
      {comments.isPending ? <LoadingState label="Loading comments…" /> : null}
      {comments.isError ? (
        <ErrorState
          title="Could not load the comments"
          message={errorMessage(comments.error)}
          onRetry={() => comments.refetch()}
          retrying={comments.isFetching}
        />
      ) : null}
      {comments.data?.length === 0 ? <Text tone="muted">No comments yet.</Text> : null}
      {comments.data?.map((comment, index) => (
        <View key={comment.id} style={index > 0 ? styles.divider : undefined}>
          <CommentItem
            studyId={study.id}
            comment={comment}
            canDelete={isOwner || comment.author?.id === session.user.id}
            onAnchorPress={onAnchorPress}
          />
        </View>
      ))}
      <View style={styles.divider}>
        <CommentForm
          studyId={study.id}
          chartAnchor={anchor ?? null}
          onClearChartAnchor={() => onAnchorChange?.(null)}
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.xs },
  divider: { borderTopWidth: 1, borderTopColor: color.border },
});
