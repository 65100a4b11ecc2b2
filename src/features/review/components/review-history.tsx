import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import { formatDateTime } from '@/features/studies/format';

import type { Review } from '../types';

export type ReviewHistoryProps = { reviews: readonly Review[] };

const VERB = { approved: 'approved', changes_requested: 'asked for changes to' } as const;

/** Every decision so far, newest first, with the revision it was given on. */
export function ReviewHistory({ reviews }: ReviewHistoryProps) {
  if (reviews.length === 0) return null;
  return (
    <View style={styles.list}>
      <Text variant="label" tone="muted">
        Reviews
      </Text>
      {[...reviews].reverse().map((review) => (
        <View key={review.id} testID={`review-${review.id}`} style={styles.item}>
          <Text>
            <Text variant="bodyStrong">{review.reviewer?.name ?? 'A former member'}</Text> {VERB[review.decision]} revision{' '}
            {review.revision}
          </Text>
          {review.comment ? <Text style={styles.comment}>“{review.comment}”</Text> : null}
          <Text variant="caption" tone="faint">
            {formatDateTime(review.createdAt)}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm, paddingTop: spacing.md, borderTopWidth: 1, borderTopColor: color.border },
  item: { gap: spacing.xxs },
  comment: { paddingLeft: spacing.md, borderLeftWidth: 2, borderLeftColor: color.borderStrong },
});
