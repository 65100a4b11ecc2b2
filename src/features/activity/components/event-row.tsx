import { StyleSheet, View } from 'react-native';

import { PressableLink, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { formatDateTime } from '@/features/studies/format';

import type { EventSentence } from '../describe-event';

export type EventRowProps = { sentence: EventSentence; at: string };

/** One log line; lines about a study that still exists open it. */
export function EventRow({ sentence, at }: EventRowProps) {
  const content = (
    <>
      <Text tone={sentence.studyId === undefined ? 'default' : 'accent'} style={styles.text}>
        {sentence.text}
      </Text>
      <Text variant="caption" tone="faint" style={styles.time}>
        {formatDateTime(at)}
      </Text>
    </>
  );
  if (sentence.studyId === undefined) return <View style={styles.row}>{content}</View>;
  return (
    <PressableLink href={`/studies/${sentence.studyId}`} style={styles.row} activeStyle={styles.active}>
      {content}
    </PressableLink>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    justifyContent: 'space-between',
    alignItems: 'baseline',
    columnGap: spacing.md,
    rowGap: spacing.xxs,
    paddingVertical: spacing.sm,
    paddingHorizontal: spacing.sm,
    marginHorizontal: -spacing.sm,
    borderRadius: radius.md,
  },
  active: { backgroundColor: color.surfaceMuted },
  text: { flexShrink: 1 },
  time: { flexShrink: 0 },
});
