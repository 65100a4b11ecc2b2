import { StyleSheet, View } from 'react-native';

import { Text, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { FactGrid } from '@/features/studies/components/fact-grid';
import { StatusBadge } from '@/features/studies/components/status-badge';
import { formatDateTime } from '@/features/studies/format';
import { STATUS_LABELS } from '@/features/studies/status';
import type { Study } from '@/features/studies/types';

export type ReportHeaderProps = { study: Study; printedAt: string };

/** What the report is about: the study, its team, status, revision, author and dates. */
export function ReportHeader({ study, printedAt }: ReportHeaderProps) {
  const wide = useIsWide();
  return (
    <View testID="report-header" style={styles.header}>
      <Text variant="label" tone="muted" style={styles.eyebrow}>
        Study report
      </Text>
      <Text variant={wide ? 'display' : 'title'}>{study.title}</Text>
      <StatusBadge status={study.status} />
      <FactGrid
        facts={[
          { label: 'Team', value: study.teamName },
          { label: 'Status', value: STATUS_LABELS[study.status] },
          { label: 'Revision', value: `Revision ${study.version}` },
          { label: 'Author', value: study.author.name },
          { label: 'Created', value: formatDateTime(study.createdAt) },
          { label: 'Last saved', value: formatDateTime(study.updatedAt) },
          { label: 'Report made', value: formatDateTime(printedAt) },
        ]}
      />
      <Text tone={study.description ? 'default' : 'muted'}>{study.description || 'No description.'}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.md },
  eyebrow: { textTransform: 'uppercase', letterSpacing: 0.6 },
});
