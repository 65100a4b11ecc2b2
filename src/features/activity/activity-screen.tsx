import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, errorStatus } from '@/api';
import { Card, EmptyState, ErrorState, LoadingState, Page, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import { useStudies } from '@/features/studies/api';
import { useMembers } from '@/features/team/api';
import { useCurrentTeam } from '@/features/team/current-team';

import { useActivity } from './api';
import { EventRow } from './components/event-row';
import { describeEvent, type ActivityNames } from './describe-event';

/** The current team's audit log, for its owners, newest first. */
export function ActivityScreen() {
  const { team } = useCurrentTeam();
  const teamId = team?.teamId ?? 0;
  const isOwner = team?.role === 'owner';
  const activity = useActivity(teamId, isOwner);
  const studies = useStudies();
  const members = useMembers(teamId, isOwner);

  const names = useMemo<ActivityNames>(() => {
    const titles = new Map((studies.data ?? []).map((s) => [s.id, s.title]));
    const people = new Map((members.data ?? []).map((m) => [m.userId, m.name]));
    return { studyTitle: (id) => titles.get(id), memberName: (id) => people.get(id) };
  }, [studies.data, members.data]);

  let body;
  if (!isOwner || errorStatus(activity.error) === 403) {
    body = <EmptyState title="Only team owners read the activity log" />;
  } else if (activity.isPending) {
    body = <LoadingState label="Loading activity…" />;
  } else if (activity.isError) {
    body = (
      <ErrorState
        title="Could not load the activity"
        message={errorMessage(activity.error)}
        onRetry={() => activity.refetch()}
        retrying={activity.isFetching}
      />
    );
  } else if (activity.data.length === 0) {
    body = <EmptyState title="Nothing has happened yet" />;
  } else {
    body = (
      <Card style={styles.card}>
        {activity.data.map((event, index) => (
          <View key={event.id} style={index > 0 ? styles.divider : undefined}>
            <EventRow sentence={describeEvent(event, names)} at={event.createdAt} />
          </View>
        ))}
      </Card>
    );
  }

  return (
    <Page width="readable">
      <View style={styles.heading}>
        <Text variant="title">Activity</Text>
        <Text tone="muted">{team ? `What happened in ${team.teamName}, newest first.` : 'What happened in your team.'}</Text>
      </View>
      {body}
    </Page>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xxs },
  card: { gap: 0, paddingVertical: spacing.sm },
  divider: { borderTopWidth: 1, borderTopColor: color.border },
});
