import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import type { StudyResult } from '@/core/study';
import { spacing } from '@/constants/theme';
import { TOUCH_BURN_C } from '@/features/results/components/sink-table';
import { MAINS_FED_TEXT, mainsCaution, mainsHintText } from '@/features/results/mains-hint';
import { formatQuantity } from '@/features/studies/quantity-format';

import { ReportSection } from './report-section';

export type ReportCautionsProps = {
  result: StudyResult | null;
  /** The saved document, for its mains flag (or the hint from its text). */
  document: unknown;
};

/** The cautions that go with every report (PHYSICS.md §7), naming any sink hot enough to burn. */
export function ReportCautions({ result, document }: ReportCautionsProps) {
  const mains = mainsCaution(document);
  const hot = result ? Object.values(result.sinks).filter((s) => s.peakC > TOUCH_BURN_C) : [];
  return (
    <ReportSection name="cautions" title="Cautions">
      <View style={styles.list}>
        <Text>
          <Text variant="bodyStrong">Estimates. </Text>
          These results are estimates from datasheet values. Confirm the margins by measurement before relying on them:
          a thermocouple on the case, or the electrical method of JEDEC JESD51-1.
        </Text>
        <Text>
          <Text variant="bodyStrong">Hot surfaces. </Text>
          {`Surfaces above about ${TOUCH_BURN_C} °C can burn on contact`}
          {hot.length ? `: ${hot.map((s) => `${s.id} reaches ${formatQuantity(s.peakC, '°C')}`).join(', ')}` : ''}. For the limits on
          parts that can be touched, defer to IEC 62368-1 and to local codes.
        </Text>
        {mains ? (
          <Text testID={mains.kind === 'fed' ? 'report-mains-caution' : 'report-mains-hint'}>
            <Text variant="bodyStrong">Mains. </Text>
            {mains.kind === 'fed' ? MAINS_FED_TEXT : mainsHintText(mains.word)}
          </Text>
        ) : null}
      </View>
    </ReportSection>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.md },
});
