import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { color, radius, spacing } from '@/constants/theme';

import { Text } from './text';

export type EmptyStateProps = { title: string; message?: string; action?: ReactNode };

export function EmptyState({ title, message, action }: EmptyStateProps) {
  return (
    <View style={styles.box}>
      <Text variant="heading">{title}</Text>
      {message ? <Text tone="muted">{message}</Text> : null}
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.sm,
    padding: spacing.xl,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderStyle: 'dashed',
    borderColor: color.borderStrong,
    alignItems: 'flex-start',
  },
});
