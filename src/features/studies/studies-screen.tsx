import { useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, EmptyState, ErrorState, LoadingState, Page, Text, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { teamsWhereCanCreate } from '@/features/auth/roles';
import { ImportStudyPanel } from '@/features/study-file/components/import-study-panel';
import { StudyFilePicker } from '@/features/study-file/components/study-file-picker';
import { useStudyFileImport } from '@/features/study-file/use-study-file-import';
import { useCurrentTeam } from '@/features/team/current-team';

import { useStudies } from './api';
import { StudyCard } from './components/study-card';
import { StudyFilters } from './components/study-filters';
import { StudyTable } from './components/study-table';
import { DEFAULT_SORT, nextSort, queryStudies, type StatusFilter, type StudySort } from './study-list-query';

export function StudiesScreen() {
  const router = useRouter();
  const wide = useIsWide();
  const { team, selectTeam } = useCurrentTeam();
  const canCreate = team !== null && teamsWhereCanCreate([team]).length > 0;
  const studies = useStudies();
  // The list shows the team picked in the team switcher.
  const teamStudies = useMemo(
    () => studies.data?.filter((study) => !team || study.teamId === team.teamId),
    [studies.data, team],
  );

  const [search, setSearch] = useState('');
  const [status, setStatus] = useState<StatusFilter>('all');
  const [sort, setSort] = useState<StudySort>(DEFAULT_SORT);
  const shown = useMemo(
    () => queryStudies(teamStudies ?? [], search, status, sort),
    [teamStudies, search, status, sort],
  );

  const newStudy = canCreate ? <Button label="New study" onPress={() => router.push('/studies/new')} /> : null;
  const importer = useStudyFileImport(team?.teamId, (study) => {
    selectTeam(study.teamId);
    router.push(`/studies/${study.id}`);
  });

  return (
    <Page>
      <View style={styles.header}>
        <View style={styles.heading}>
          <Text variant="title">Studies</Text>
          <Text tone="muted">
            {teamStudies
              ? `${teamStudies.length} ${teamStudies.length === 1 ? 'study' : 'studies'} in ${team?.teamName ?? 'your teams'}`
              : 'Design questions your teams are working on'}
          </Text>
        </View>
        {canCreate ? (
          <View style={styles.actions}>
            {newStudy}
            <StudyFilePicker label="Import study file" onPick={importer.pick} />
          </View>
        ) : null}
      </View>
      {team ? <ImportStudyPanel importer={importer} teamName={team.teamName} /> : null}

      {studies.isPending ? (
        <LoadingState label="Loading studies…" />
      ) : studies.isError ? (
        <ErrorState
          title="Could not load the studies"
          message={errorMessage(studies.error)}
          onRetry={() => studies.refetch()}
          retrying={studies.isFetching}
        />
      ) : teamStudies?.length === 0 ? (
        <EmptyState
          title="No studies yet"
          message={
            canCreate
              ? 'A study holds one design question: the pass element, its sink and the load it must survive.'
              : 'Studies appear here once a designer in your team creates one.'
          }
          action={newStudy}
        />
      ) : (
        <>
          <StudyFilters search={search} onSearch={setSearch} status={status} onStatus={setStatus} wide={wide} />
          {shown.length === 0 ? (
            <EmptyState title="No matching studies" message="Change the search words or the status filter." />
          ) : wide ? (
            <StudyTable studies={shown} sort={sort} onSort={(key) => setSort((s) => nextSort(s, key))} />
          ) : (
            <View style={styles.cards}>
              {shown.map((study) => (
                <StudyCard key={study.id} study={study} />
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
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  cards: { gap: spacing.md },
});
