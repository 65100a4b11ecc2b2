import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import type { StudyDocument, StudyResult } from '@/core/study';
import { spacing } from '@/constants/theme';

import { assumptionGroups } from '../assumption-lines';
import { ReportPart, ReportSection } from './report-section';

export type ReportAssumptionsProps = { document: StudyDocument; raw: unknown; result: StudyResult | null };

/** How the figures were made and what they leave out. */
export function ReportAssumptions({ document, raw, result }: ReportAssumptionsProps) {
  return (
    <ReportSection name="assumptions" title="Assumptions">
      {result ? (
        assumptionGroups(document, raw, result).map((group) => (
          <ReportPart key={group.title} title={group.title}>
            <View style={styles.lines}>
              {group.lines.map((line) => (
                <Text key={line}>{`• ${line}`}</Text>
              ))}
            </View>
          </ReportPart>
        ))
      ) : (
        <Text tone="muted">The assumptions follow from the solved study, which has no results.</Text>
      )}
    </ReportSection>
  );
}

const styles = StyleSheet.create({
  lines: { gap: spacing.xs },
});
