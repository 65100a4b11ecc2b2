import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import { formatQuantity } from '@/features/studies/quantity-format';

import { TOUCH_BURN_C } from './sink-table';

export type ResultsCautionProps = {
  hotSinks: readonly { id: string; peakC: number }[];
  /** What in the study points to a mains-fed supply (see mainsHint), or null. */
  mains?: string | null;
};

/** The cautions that go with the numbers (PHYSICS.md §7), naming any sink hot enough to burn. */
export function ResultsCaution({ hotSinks, mains = null }: ResultsCautionProps) {
  const hot = hotSinks.filter((s) => s.peakC > TOUCH_BURN_C);
  return (
    <View role="note" style={styles.note}>
      <Text variant="caption" tone="muted">
        These figures are estimates from datasheet values: confirm the margins by measurement (a thermocouple on the
        case, or the electrical method of JEDEC JESD51-1) before relying on them.
      </Text>
      <Text variant="caption" tone={hot.length ? 'danger' : 'muted'}>
        Heatsinks above about {TOUCH_BURN_C} °C can burn on contact
        {hot.length ? `: ${hot.map((s) => `${s.id} reaches ${formatQuantity(s.peakC, '°C')}`).join(', ')}` : ''}. Limits for
        parts people can touch come from safety standards such as IEC 62368-1 and local codes.
      </Text>
      {mains ? (
        <Text variant="caption" tone="danger" testID="mains-caution">
          {`The study mentions ${mains}: if this supply is fed from the mains, its mains wiring follows the local electrical codes and is done by qualified people.`}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  note: { gap: spacing.xxs, paddingTop: spacing.sm, borderTopWidth: 1, borderTopColor: color.border },
});
