import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { color, spacing } from '@/constants/theme';

import { Text } from './text';

export type LoadingStateProps = { label?: string };

export function LoadingState({ label = 'Loading…' }: LoadingStateProps) {
  return (
    <View style={styles.box} role="progressbar" aria-busy accessibilityLabel={label}>
      <ActivityIndicator color={color.accent} />
      <Text tone="muted">{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { alignItems: 'center', justifyContent: 'center', gap: spacing.md, padding: spacing.xxl },
});
