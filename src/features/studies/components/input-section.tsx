import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

export type InputSectionProps = { title: string; children: ReactNode };

export function InputSection({ title, children }: InputSectionProps) {
  return (
    <View style={styles.section}>
      <Text variant="label" tone="muted" style={styles.title}>
        {title}
      </Text>
      {children}
    </View>
  );
}

export type InputItemProps = { name: string; id: string; facts: readonly string[] };

/** One device or sink: its name, its id in the document, and its key values. */
export function InputItem({ name, id, facts }: InputItemProps) {
  return (
    <View style={styles.item}>
      <Text variant="bodyStrong">
        {name}{' '}
        <Text variant="mono" tone="faint">
          {id}
        </Text>
      </Text>
      <Text variant="caption" tone="muted">
        {facts.join(' · ')}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.sm, paddingTop: spacing.md, borderTopWidth: 1, borderTopColor: color.border },
  title: { textTransform: 'uppercase', letterSpacing: 0.6 },
  item: { gap: spacing.xxs },
});
