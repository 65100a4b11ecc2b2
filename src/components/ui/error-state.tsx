import { StyleSheet, View } from 'react-native';

import { color, radius, spacing } from '@/constants/theme';

import { Button } from './button';
import { Text } from './text';

export type ErrorStateProps = {
  title?: string;
  message: string;
  onRetry?: () => void;
  retrying?: boolean;
};

export function ErrorState({ title = 'Could not load this', message, onRetry, retrying }: ErrorStateProps) {
  return (
    <View role="alert" style={styles.box}>
      <Text variant="heading">{title}</Text>
      <Text tone="muted">{message}</Text>
      {onRetry ? <Button label="Try again" variant="secondary" onPress={onRetry} busy={retrying} style={styles.retry} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.sm,
    padding: spacing.xl,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: color.danger,
    backgroundColor: color.dangerSoft,
    alignItems: 'flex-start',
  },
  retry: { marginTop: spacing.sm },
});
