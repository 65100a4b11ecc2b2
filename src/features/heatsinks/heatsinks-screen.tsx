import { useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, EmptyState, ErrorState, LoadingState, Page, Text, TextField, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { CatalogueActions } from '@/features/catalogues/components/catalogue-actions';
import { CatalogueTabs } from '@/features/catalogues/components/catalogue-tabs';
import { SortChips, type SortState } from '@/features/catalogues/components/sort-chips';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { useCurrentTeam } from '@/features/team/current-team';

import { useHeatsinks } from './api';
import { HeatsinkCard } from './components/heatsink-card';
import { HeatsinkTable } from './components/heatsink-table';
import { HEATSINK_SORTS, queryHeatsinks, type HeatsinkSortKey } from './heatsink-query';

const demoLine = (demo: number, all: number) => (demo === 0 ? '' : demo === all ? ', all invented demo data' : `, ${demo} of them invented demo data`);

/** The team's heatsink library: a table on a wide window, cards on a phone. */
export function HeatsinksScreen() {
  const wide = useIsWide();
  const router = useRouter();
  const { team, memberships } = useCurrentTeam();
  const heatsinks = useHeatsinks(team?.teamId);
  const canEdit = canEditCatalogue(memberships, team?.teamId);
  const [search, setSearch] = useState('');
  const [sort, setSort] = useState<SortState<HeatsinkSortKey>>({ key: 'rth', direction: 'asc' });
  const shown = useMemo(() => queryHeatsinks(heatsinks.data ?? [], search, sort), [heatsinks.data, search, sort]);
  const demoCount = heatsinks.data?.filter((h) => h.isDemo).length ?? 0;

  return (
    <Page>
      <CatalogueTabs current="/heatsinks" />
      <View style={styles.header}>
        <View style={styles.heading}>
          <Text variant="title">Heatsinks</Text>
          <Text tone="muted">
            {heatsinks.data
              ? `${heatsinks.data.length} ${heatsinks.data.length === 1 ? 'heatsink' : 'heatsinks'} in ${team?.teamName ?? 'your teams'}${demoLine(demoCount, heatsinks.data.length)}`
              : 'The team’s catalogue of sinks, with Rθsa in still air and forced air'}
          </Text>
        </View>
        <View style={styles.actions}>
          <CatalogueActions
            resource="heatsinks"
            teamId={team?.teamId}
            canEdit={canEdit}
            newLabel="New heatsink"
            newHref="/heatsinks/new"
            importHref="/heatsinks/import"
          />
          <Button label="Design from geometry" variant="secondary" onPress={() => router.push('/heatsinks/design')} style={styles.design} />
        </View>
      </View>

      {heatsinks.isPending ? (
        <LoadingState label="Loading heatsinks…" />
      ) : heatsinks.isError ? (
        <ErrorState
          title="Could not load the heatsinks"
          message={errorMessage(heatsinks.error)}
          onRetry={() => heatsinks.refetch()}
          retrying={heatsinks.isFetching}
        />
      ) : heatsinks.data.length === 0 ? (
        <EmptyState
          title="No heatsinks yet"
          message={canEdit ? 'Add one by hand or import a vendor table as CSV.' : 'Heatsinks appear here once an owner or designer adds them.'}
        />
      ) : (
        <>
          <View style={[styles.filters, wide && styles.filtersWide]}>
            <View style={wide ? styles.search : undefined}>
              <TextField
                label="Search heatsinks"
                placeholder="Name, description, material…"
                value={search}
                onChangeText={setSearch}
                autoCapitalize="none"
                autoCorrect={false}
                inputMode="search"
              />
            </View>
            <SortChips options={HEATSINK_SORTS} sort={sort} onSort={setSort} />
          </View>
          {shown.length === 0 ? (
            <EmptyState title="No matching heatsinks" message="Change the search words." />
          ) : wide ? (
            <HeatsinkTable items={shown} />
          ) : (
            <View style={styles.cards}>
              {shown.map((h) => (
                <HeatsinkCard key={h.id} heatsink={h} />
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
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.sm, maxWidth: '100%' },
  design: { alignSelf: 'flex-start' },
  filters: { gap: spacing.md },
  filtersWide: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.xl },
  search: { width: 320 },
  cards: { gap: spacing.md },
});
