import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Chip, EmptyState, ErrorState, LoadingState, Page, Text, TextField, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { SortChips, type SortState } from '@/features/catalogues/components/sort-chips';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { useCurrentTeam } from '@/features/team/current-team';

import { useParts } from './api';
import { PartActions } from './components/part-actions';
import { PartCard } from './components/part-card';
import { PartTable } from './components/part-table';
import { KIND_FILTERS, PART_SORTS, queryParts, type KindFilter, type PartSortKey } from './part-query';

const demoLine = (demo: number, all: number) => (demo === 0 ? '' : demo === all ? ', all invented demo data' : `, ${demo} of them invented demo data`);

/** The team's parts library: a table on a wide window, cards on a phone. */
export function PartsScreen() {
  const wide = useIsWide();
  const { team, memberships } = useCurrentTeam();
  const parts = useParts(team?.teamId);
  const canEdit = canEditCatalogue(memberships, team?.teamId);
  const [search, setSearch] = useState('');
  const [kind, setKind] = useState<KindFilter>('all');
  const [sort, setSort] = useState<SortState<PartSortKey>>({ key: 'name', direction: 'asc' });
  const shown = useMemo(() => queryParts(parts.data ?? [], search, kind, sort), [parts.data, search, kind, sort]);
  const demoCount = parts.data?.filter((p) => p.isDemo).length ?? 0;

  return (
    <Page>
      <View style={styles.header}>
        <View style={styles.heading}>
          <Text variant="title">Parts</Text>
          <Text tone="muted">
            {parts.data
              ? `${parts.data.length} ${parts.data.length === 1 ? 'part' : 'parts'} in ${team?.teamName ?? 'your teams'}${demoLine(demoCount, parts.data.length)}`
              : 'Regulators and pass transistors with their thermal, electrical and SOA models'}
          </Text>
        </View>
        <PartActions teamId={team?.teamId} canEdit={canEdit} />
      </View>

      {parts.isPending ? (
        <LoadingState label="Loading parts…" />
      ) : parts.isError ? (
        <ErrorState title="Could not load the parts" message={errorMessage(parts.error)} onRetry={() => parts.refetch()} retrying={parts.isFetching} />
      ) : parts.data.length === 0 ? (
        <EmptyState
          title="No parts yet"
          message={canEdit ? 'Add one by hand, fit its Zth from a datasheet curve, or import a table as CSV.' : 'Parts appear here once an owner or designer adds them.'}
        />
      ) : (
        <>
          <View style={[styles.filters, wide && styles.filtersWide]}>
            <View style={wide ? styles.search : undefined}>
              <TextField
                label="Search"
                placeholder="Name, package or notes"
                value={search}
                onChangeText={setSearch}
                autoCapitalize="none"
                autoCorrect={false}
                inputMode="search"
              />
            </View>
            <View style={styles.chipsBlock}>
              <View role="radiogroup" aria-label="Kind" style={styles.chips}>
                {KIND_FILTERS.map((f) => (
                  <Chip key={f.value} label={f.label} selected={kind === f.value} onPress={() => setKind(f.value)} />
                ))}
              </View>
              <SortChips options={PART_SORTS} sort={sort} onSort={setSort} />
            </View>
          </View>
          {shown.length === 0 ? (
            <EmptyState title="No matching parts" message="Change the search words or the kind." />
          ) : wide ? (
            <PartTable items={shown} />
          ) : (
            <View style={styles.cards}>
              {shown.map((p) => (
                <PartCard key={p.id} part={p} />
              ))}
            </View>
          )}
        </>
      )}
    </Page>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'flex-end', gap: spacing.md },
  heading: { gap: spacing.xxs, flexShrink: 1 },
  filters: { gap: spacing.md },
  filtersWide: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.xl },
  search: { width: 320 },
  chipsBlock: { gap: spacing.sm, flexShrink: 1 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  cards: { gap: spacing.md },
});
