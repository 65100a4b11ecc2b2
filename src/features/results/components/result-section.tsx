import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

export type ResultSectionProps = { title: string; children: ReactNode };

export function ResultSection({ title, children }: ResultSectionProps) {
  return (
    <View style={styles.section}>
      <Text variant="label" tone="muted" role="heading" style={styles.title}>
        {title}
      </Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.sm, paddingTop: spacing.md, borderTopWidth: 1, borderTopColor: color.border },
  title: { textTransform: 'uppercase', letterSpacing: 0.6 },
});
