import { StyleSheet, View } from 'react-native';

import { PressableLink, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { formatDate } from '../format';
import type { StudySummary } from '../types';
import { StatusBadge } from './status-badge';

// Keeps the date on one line when the meta line wraps.
const NBSP = '\u00a0';

export type StudyCardProps = { study: StudySummary };

export function StudyCard({ study }: StudyCardProps) {
  return (
    <PressableLink
      href={`/studies/${study.id}`}
      testID={`study-card-${study.id}`}
      style={styles.card}
      activeStyle={styles.active}
    >
      <View style={styles.head}>
        <StatusBadge status={study.status} />
        <Text variant="caption" tone="faint">
          v{study.version}
        </Text>
      </View>
      <Text variant="heading">{study.title}</Text>
      {study.description ? (
        <Text tone="muted" numberOfLines={2}>
          {study.description}
        </Text>
      ) : null}
      <Text variant="caption" tone="faint">
        {study.author.name} · {study.teamName} · updated {formatDate(study.updatedAt).replace(/ /g, NBSP)}
      </Text>
    </PressableLink>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: spacing.sm,
    padding: spacing.lg,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: color.border,
    backgroundColor: color.surface,
  },
  active: { borderColor: color.accent },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
});
