import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

/** The standing caution under every study (see the physics reference, cautions). */
export function EstimateCaution() {
  return (
    <View role="note" style={styles.note}>
      <Text variant="caption" tone="muted">
        Results are estimates from datasheet values. Confirm margins by measurement, for example a thermocouple on
        the case, before relying on them. Heatsinks above about 60 °C can burn on contact.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  note: { borderTopWidth: 1, borderTopColor: color.border, paddingTop: spacing.md, marginTop: spacing.sm },
});
