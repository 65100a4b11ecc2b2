import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

/** Marks invented demo entries of a catalogue. */
export function DemoBadge() {
  return (
    <View style={styles.badge} accessibilityLabel="Demo data">
      <Text variant="caption" style={styles.text}>
        Demo
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    alignSelf: 'flex-start',
    paddingHorizontal: spacing.sm,
    paddingVertical: 1,
    borderRadius: radius.pill,
    borderWidth: 1,
    borderColor: color.info,
    backgroundColor: color.infoSoft,
  },
  text: { color: color.info, fontWeight: '500' },
});
