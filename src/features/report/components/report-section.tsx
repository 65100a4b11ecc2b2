import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

export type ReportSectionProps = {
  /** Names the section for print rules (`report-section-<name>`) and tests. */
  name: string;
  title: string;
  children: ReactNode;
};

/** One numbered part of the report; printing starts each on a new page. */
export function ReportSection({ name, title, children }: ReportSectionProps) {
  return (
    <View testID={`report-section-${name}`} style={styles.section}>
      <Text variant="title">{title}</Text>
      {children}
    </View>
  );
}

export type ReportPartProps = { title: string; children: ReactNode };

/** A titled part inside a section (a table and what it needs). */
export function ReportPart({ title, children }: ReportPartProps) {
  return (
    <View style={styles.part}>
      <Text variant="heading">{title}</Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.lg, paddingTop: spacing.xl, borderTopWidth: 2, borderTopColor: color.ink },
  part: { gap: spacing.sm },
});
