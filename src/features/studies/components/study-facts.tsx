import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

import { formatDateTime } from '../format';
import type { StudySummary } from '../types';

export type StudyFactsProps = { study: StudySummary; wide: boolean };

export function StudyFacts({ study, wide }: StudyFactsProps) {
  const facts = [
    { label: 'Team', value: study.teamName },
    { label: 'Author', value: study.author.name },
    { label: 'Revision', value: `v${study.version}` },
    { label: 'Created', value: formatDateTime(study.createdAt) },
    { label: 'Updated', value: formatDateTime(study.updatedAt) },
  ];
  return (
    <View style={[styles.grid, wide && styles.gridWide]}>
      {facts.map((fact) => (
        <View key={fact.label} style={[styles.fact, wide && styles.factWide]}>
          <Text variant="caption" tone="faint">
            {fact.label}
          </Text>
          <Text variant="body">{fact.value}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', rowGap: spacing.md, columnGap: spacing.xl },
  gridWide: { columnGap: spacing.xxl },
  fact: { minWidth: 130, gap: spacing.xxs },
  factWide: { minWidth: 150 },
});
