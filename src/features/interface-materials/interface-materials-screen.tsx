import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { EmptyState, ErrorState, LoadingState, Page, Text, TextField, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { CatalogueActions } from '@/features/catalogues/components/catalogue-actions';
import { CatalogueTabs } from '@/features/catalogues/components/catalogue-tabs';
import { SortChips, type SortState } from '@/features/catalogues/components/sort-chips';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { useCurrentTeam } from '@/features/team/current-team';

import { useInterfaceMaterials } from './api';
import { InterfaceCard } from './components/interface-card';
import { InterfaceTable } from './components/interface-table';
import { INTERFACE_SORTS, queryInterfaces, type InterfaceSortKey } from './interface-query';

/** The team's interface materials: pads, greases and washers between case and sink. */
export function InterfaceMaterialsScreen() {
  const wide = useIsWide();
  const { team, memberships } = useCurrentTeam();
  const materials = useInterfaceMaterials(team?.teamId);
  const canEdit = canEditCatalogue(memberships, team?.teamId);
  const [search, setSearch] = useState('');
  const [sort, setSort] = useState<SortState<InterfaceSortKey>>({ key: 'name', direction: 'asc' });
  const shown = useMemo(() => queryInterfaces(materials.data ?? [], search, sort), [materials.data, search, sort]);

  return (
    <Page>
      <CatalogueTabs current="/interface-materials" />
      <View style={styles.header}>
        <View style={styles.heading}>
          <Text variant="title">Interface materials</Text>
          <Text tone="muted">
            {materials.data ? `${materials.data.length} in ${team?.teamName ?? 'your teams'}` : 'Pads, greases and washers between case and sink'}
          </Text>
        </View>
        <CatalogueActions
          resource="interface-materials"
          teamId={team?.teamId}
          canEdit={canEdit}
          newLabel="New material"
          newHref="/interface-materials/new"
          importHref="/interface-materials/import"
        />
      </View>
      {materials.isPending ? (
        <LoadingState label="Loading interface materials…" />
      ) : materials.isError ? (
        <ErrorState title="Could not load the interface materials" message={errorMessage(materials.error)} onRetry={() => materials.refetch()} retrying={materials.isFetching} />
      ) : materials.data.length === 0 ? (
        <EmptyState title="No interface materials yet" message={canEdit ? 'Add one by hand or import a table as CSV.' : 'They appear here once an owner or designer adds them.'} />
      ) : (
        <>
          <View style={[styles.filters, wide && styles.filtersWide]}>
            <View style={wide ? styles.search : undefined}>
              <TextField label="Search interface materials" placeholder="Name, package…" value={search} onChangeText={setSearch} autoCapitalize="none" autoCorrect={false} inputMode="search" />
            </View>
            <SortChips options={INTERFACE_SORTS} sort={sort} onSort={setSort} />
          </View>
          {shown.length === 0 ? (
            <EmptyState title="No matching materials" message="Change the search words." />
          ) : wide ? (
            <InterfaceTable items={shown} />
          ) : (
            <View style={styles.cards}>
              {shown.map((m) => (
                <InterfaceCard key={m.id} material={m} />
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
  cards: { gap: spacing.md },
});
