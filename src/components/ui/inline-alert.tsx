import { StyleSheet, View } from 'react-native';

import { color, radius, spacing } from '@/constants/theme';

import { Text } from './text';

export type InlineAlertProps = { message: string; tone?: 'danger' | 'info' };

/** A message inside a form or panel, announced to screen readers when it appears. */
export function InlineAlert({ message, tone = 'danger' }: InlineAlertProps) {
  return (
    <View role="alert" style={[styles.box, tone === 'danger' ? styles.danger : styles.info]}>
      <Text variant="body" style={tone === 'danger' ? styles.dangerText : styles.infoText}>
        {message}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderRadius: radius.md, borderWidth: 1, paddingHorizontal: spacing.md, paddingVertical: spacing.sm },
  danger: { backgroundColor: color.dangerSoft, borderColor: color.danger },
  info: { backgroundColor: color.infoSoft, borderColor: color.info },
  dangerText: { color: color.danger },
  infoText: { color: color.info },
});
