import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

/** A small line beside results that are being solved again: the figures shown are the last ones. */
export function UpdatingNote() {
  return (
    <View style={styles.row} role="status" aria-live="polite" testID="results-updating">
      <ActivityIndicator size="small" color={color.accent} />
      <Text variant="caption" tone="muted">
        Updating with your latest edit…
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});
