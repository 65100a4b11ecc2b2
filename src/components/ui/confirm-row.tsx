import { StyleSheet, View } from 'react-native';

import { color, radius, spacing } from '@/constants/theme';

import { Button } from './button';
import { Text } from './text';

export type ConfirmRowProps = {
  /** What will happen, in one sentence. */
  message: string;
  confirmLabel: string;
  onConfirm: () => void;
  onCancel: () => void;
  busy?: boolean;
};

/**
 * An inline "are you sure" for actions that remove or replace something. Inline rather than
 * a system dialog, which the web build does not have.
 */
export function ConfirmRow({ message, confirmLabel, onConfirm, onCancel, busy }: ConfirmRowProps) {
  return (
    <View role="alert" style={styles.box}>
      <Text>{message}</Text>
      <View style={styles.actions}>
        <Button label={confirmLabel} variant="danger" onPress={onConfirm} busy={busy} />
        <Button label="Cancel" variant="secondary" onPress={onCancel} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.sm,
    padding: spacing.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: color.warning,
    backgroundColor: color.warningSoft,
  },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
