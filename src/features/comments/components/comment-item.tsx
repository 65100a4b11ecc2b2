import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, ConfirmRow, Icon, InlineAlert, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { formatDateTime } from '@/features/studies/format';

import { anchorLabel } from '../anchor-label';
import { useDeleteComment } from '../api';
import type { CommentAnchor, StudyComment } from '../types';

export type CommentItemProps = {
  studyId: number;
  comment: StudyComment;
  canDelete: boolean;
  onAnchorPress?: (anchor: CommentAnchor) => void;
};

export function CommentItem({ studyId, comment, canDelete, onAnchorPress }: CommentItemProps) {
  const remove = useDeleteComment(studyId);
  const [confirming, setConfirming] = useState(false);
  const anchor = comment.anchor;

  return (
    <View testID={`comment-${comment.id}`} style={styles.item}>
      <View style={styles.head}>
        <Text variant="caption" tone="muted" style={styles.meta}>
          <Text variant="label">{comment.author?.name ?? 'A former member'}</Text> · {formatDateTime(comment.createdAt)} ·
          revision {comment.revision}
        </Text>
        {canDelete && !confirming ? <Button label="Delete" variant="ghost" onPress={() => setConfirming(true)} /> : null}
      </View>
      {anchor ? (
        <Pressable
          role={onAnchorPress ? 'button' : undefined}
          accessibilityLabel={`Pinned ${anchorLabel(anchor)}`}
          disabled={!onAnchorPress}
          onPress={() => onAnchorPress?.(anchor)}
          style={styles.anchor}
        >
          <Icon name="pin" size={14} color={color.accent} />
          <Text variant="label" tone="accent">
            Pinned {anchorLabel(anchor)}
          </Text>
        </Pressable>
      ) : null}
      <Text>{comment.body}</Text>
      {confirming ? (
        <ConfirmRow
          message="Delete this comment? It cannot be brought back."
          confirmLabel="Delete comment"
          busy={remove.isPending}
          onConfirm={() => remove.mutate(comment.id, { onSettled: () => setConfirming(false) })}
          onCancel={() => setConfirming(false)}
        />
      ) : null}
      {remove.isError ? <InlineAlert message={errorMessage(remove.error)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  item: { gap: spacing.xs, paddingVertical: spacing.md },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: spacing.sm, minHeight: 28 },
  meta: { flexShrink: 1 },
  anchor: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.xxs,
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xxs,
    borderRadius: radius.pill,
    backgroundColor: color.accentSoft,
  },
});
