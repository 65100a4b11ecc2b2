import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { formatDate } from '../format';
import type { SortKey, StudySort } from '../study-list-query';
import type { StudySummary } from '../types';
import { SortHeader } from './sort-header';
import { StatusBadge } from './status-badge';

export type StudyTableProps = {
  studies: readonly StudySummary[];
  sort: StudySort;
  onSort: (column: SortKey) => void;
};

const FLEX = { title: 4, status: 1.6, author: 1.6, updated: 1.3 } as const;

export function StudyTable({ studies, sort, onSort }: StudyTableProps) {
  return (
    <View role="table" aria-label="Studies" style={styles.table}>
      <View role="row" style={[styles.row, styles.header]}>
        <SortHeader label="Title" column="title" sort={sort} onSort={onSort} flex={FLEX.title} />
        <SortHeader label="Status" column="status" sort={sort} onSort={onSort} flex={FLEX.status} />
        <SortHeader label="Author" column="author" sort={sort} onSort={onSort} flex={FLEX.author} />
        <SortHeader label="Updated" column="updated" sort={sort} onSort={onSort} flex={FLEX.updated} />
      </View>
      {studies.map((study, index) => (
        <View
          key={study.id}
          role="row"
          testID={`study-row-${study.id}`}
          style={[styles.row, index < studies.length - 1 && styles.divider]}
        >
          <View role="cell" style={[styles.cell, { flex: FLEX.title }]}>
            <Link href={`/studies/${study.id}`}>
              <Text variant="bodyStrong" tone="accent">
                {study.title}
              </Text>
            </Link>
            {study.description ? (
              <Text variant="caption" tone="muted" numberOfLines={1}>
                {study.description}
              </Text>
            ) : null}
          </View>
          <View role="cell" style={[styles.cell, { flex: FLEX.status }]}>
            <StatusBadge status={study.status} />
          </View>
          <View role="cell" style={[styles.cell, { flex: FLEX.author }]}>
            <Text>{study.author.name}</Text>
          </View>
          <View role="cell" style={[styles.cell, { flex: FLEX.updated }]}>
            <Text tone="muted">
              {formatDate(study.updatedAt)}
            </Text>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: {
    borderWidth: 1,
    borderColor: color.border,
    borderRadius: radius.lg,
    backgroundColor: color.surface,
    overflow: 'hidden',
  },
  row: { flexDirection: 'row', alignItems: 'center', paddingVertical: spacing.sm },
  header: { backgroundColor: color.surfaceMuted, borderBottomWidth: 1, borderBottomColor: color.border, paddingVertical: 0 },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  cell: { paddingHorizontal: spacing.md, paddingVertical: spacing.xs, gap: spacing.xxs },
});
