import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import type { EventKind, StudyEvent } from '@/core/study';
import { color, radius, spacing } from '@/constants/theme';

import { eventCountsText, eventText, formatEventTime } from '../event-text';

/** Events listed before "show all", so a study with hundreds of shutdown cycles stays readable. */
const FIRST_SHOWN = 12;

export type EventListProps = {
  events: readonly StudyEvent[];
  counts: Record<EventKind, number>;
  selectedS: number | null;
  onSelect: (timeS: number) => void;
};

/** Dropout, current-limit and shutdown events in time order; pressing one moves the crosshair there. */
export function EventList({ events, counts, selectedS, onSelect }: EventListProps) {
  const [all, setAll] = useState(false);
  const total = Object.values(counts).reduce((a, b) => a + b, 0);
  if (total === 0) {
    return <Text tone="muted">No dropout, current limit or thermal shutdown during the run.</Text>;
  }
  const shown = all ? events : events.slice(0, FIRST_SHOWN);
  return (
    <View style={styles.wrap}>
      <Text tone="muted">
        {eventCountsText(counts)}
        {total > events.length ? `; the first ${events.length} are listed` : ''}.
      </Text>
      <View role="list" style={styles.list}>
        {shown.map((event, i) => {
          const text = eventText(event);
          const selected = selectedS === event.timeS;
          return (
            <Pressable
              key={`${event.kind}-${event.timeS}-${i}`}
              role="button"
              aria-pressed={selected}
              accessibilityLabel={`${text.title} at ${formatEventTime(event.timeS)}: show on the chart`}
              onPress={() => onSelect(event.timeS)}
              style={({ pressed }) => [styles.item, selected && styles.selected, pressed && styles.pressed]}
            >
              <Text variant="mono" tone="muted" style={styles.time}>
                {formatEventTime(event.timeS)}
              </Text>
              <View style={styles.body}>
                <Text variant="bodyStrong">{text.title}</Text>
                <Text variant="caption" tone="muted">
                  {text.detail}
                </Text>
              </View>
            </Pressable>
          );
        })}
      </View>
      {events.length > FIRST_SHOWN ? (
        <Button
          variant="ghost"
          label={all ? 'Show fewer events' : `Show all ${events.length} events`}
          onPress={() => setAll((a) => !a)}
          style={styles.more}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  list: { gap: spacing.xxs },
  item: {
    flexDirection: 'row',
    gap: spacing.md,
    paddingVertical: spacing.xs,
    paddingHorizontal: spacing.sm,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: 'transparent',
  },
  selected: { borderColor: color.accent, backgroundColor: color.accentSoft },
  pressed: { backgroundColor: color.surfaceMuted },
  time: { width: 112, paddingTop: 2 },
  body: { flex: 1, gap: spacing.xxs },
  more: { alignSelf: 'flex-start' },
});
