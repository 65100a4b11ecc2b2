import { StyleSheet, View } from 'react-native';

import { Card, EmptyState, ErrorState, InlineAlert, LoadingState, Page, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { BackLink } from '@/features/studies/components/back-link';

import { useTeamSettings } from './api';
import { DefaultsList } from './components/defaults-list';
import { TeamSettingsForm } from './components/team-settings-form';
import { useCurrentTeam } from './current-team';
import { defaultLines } from './team-settings-lines';

const WRITTEN_ONCE =
  'A new study takes these defaults as values written into it when it is created. Changing them later does not change studies already started.';

/** The team's defaults for new studies: owners edit them, every other member reads them. */
export function TeamSettingsScreen() {
  const { team } = useCurrentTeam();
  const query = useTeamSettings(team?.teamId);

  if (!team) {
    return (
      <Page width="readable">
        <Text variant="title">Team settings</Text>
        <EmptyState title="You are not in a team" message="Ask a team owner to invite you." />
      </Page>
    );
  }
  const isOwner = team.role === 'owner';
  const changed = query.data?.updatedAt
    ? `Last changed ${new Date(query.data.updatedAt).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })}${query.data.updatedBy ? ` by ${query.data.updatedBy.name}` : ''}.`
    : 'No owner has changed them yet: the built-in defaults apply.';

  return (
    <Page width="readable">
      <BackLink href="/team" label="Team" />
      <View style={styles.heading}>
        <Text variant="title">Team settings</Text>
        <Text tone="muted">{`Defaults for the studies ${team.teamName} starts. ${WRITTEN_ONCE}`}</Text>
        {query.data ? (
          <Text variant="caption" tone="faint">
            {changed}
          </Text>
        ) : null}
      </View>
      {query.isPending ? <LoadingState label="Loading the team settings" /> : null}
      {query.isError ? <ErrorState message="The team settings could not be loaded." onRetry={() => void query.refetch()} /> : null}
      {query.data && isOwner ? <TeamSettingsForm key={team.teamId} teamId={team.teamId} settings={query.data.settings} version={query.data.version} /> : null}
      {query.data && !isOwner ? (
        <>
          <InlineAlert tone="info" message="Only owners change the team settings; you see them read-only." />
          <Card>
            <DefaultsList lines={defaultLines(query.data.settings)} testID="team-defaults" />
          </Card>
        </>
      ) : null}
    </Page>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xxs },
});
