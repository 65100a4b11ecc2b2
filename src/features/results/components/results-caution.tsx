import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import { formatQuantity } from '@/features/studies/quantity-format';

import { MAINS_FED_TEXT, mainsHintText, type MainsCaution } from '../mains-hint';
import { TOUCH_BURN_C } from './sink-table';

export type ResultsCautionProps = {
  hotSinks: readonly { id: string; peakC: number }[];
  /** The study's mains flag, or the hint from its text (see mainsCaution), or null. */
  mains?: MainsCaution | null;
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
      {mains?.kind === 'fed' ? (
        <Text variant="caption" tone="danger" testID="mains-caution">
          {MAINS_FED_TEXT}
        </Text>
      ) : null}
      {mains?.kind === 'hint' ? (
        <Text variant="caption" tone="muted" testID="mains-hint">
          {mainsHintText(mains.word)}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  note: { gap: spacing.xxs, paddingTop: spacing.sm, borderTopWidth: 1, borderTopColor: color.border },
});
