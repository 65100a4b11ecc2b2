import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import type { EstimateNotes as Notes } from '@/core/heatsink';
import { color, radius, spacing } from '@/constants/theme';

import { checkSentence } from '../check-format';

export type EstimateNotesProps = { title: string; notes: Notes };

/** The checks an estimate rests on, each with its value and valid range (out-of-range ones flagged), and its assumptions folded away. */
export function EstimateNotes({ title, notes }: EstimateNotesProps) {
  const [open, setOpen] = useState(false);
  const out = notes.validity.filter((c) => !c.inRange).length;
  return (
    <View style={styles.wrap}>
      <Text variant="label" tone={out ? 'danger' : 'muted'}>
        {out ? `${title}: ${out} of ${notes.validity.length} checks out of range, treat the figure with care` : `${title}: every check in range`}
      </Text>
      <View role="list" aria-label={`${title} checks`} style={styles.list}>
        {notes.validity.map((c) => (
          <View key={c.quantity} role="listitem" style={[styles.check, !c.inRange && styles.outside]}>
            <Text variant="caption" tone={c.inRange ? 'default' : 'danger'}>
              {checkSentence(c)}
            </Text>
            <Text variant="caption" tone="faint">
              {c.basis}
            </Text>
          </View>
        ))}
      </View>
      <Button variant="ghost" label={open ? 'Hide the assumptions' : `Assumptions (${notes.assumptions.length})`} onPress={() => setOpen((o) => !o)} style={styles.toggle} />
      {open ? (
        <View role="list" aria-label={`${title} assumptions`} style={styles.list}>
          {notes.assumptions.map((a) => (
            <Text key={a} role="listitem" variant="caption" tone="muted">
              {`• ${a}`}
            </Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  list: { gap: spacing.xxs },
  check: { paddingVertical: spacing.xxs, paddingHorizontal: spacing.sm, borderLeftWidth: 3, borderLeftColor: color.border, borderRadius: radius.sm },
  outside: { borderLeftColor: color.danger, backgroundColor: color.dangerSoft },
  toggle: { alignSelf: 'flex-start', minHeight: 32 },
});
