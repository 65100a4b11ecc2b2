import { EmptyState, Page, Text } from '@/components/ui';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { BackLink } from '@/features/studies/components/back-link';
import { useCurrentTeam } from '@/features/team/current-team';

import { PartImportFlow } from './components/part-import-flow';

/** Import a table of simple parts from CSV into the current team's library. */
export function PartImportScreen() {
  const { team, memberships } = useCurrentTeam();
  return (
    <Page>
      <BackLink href="/parts" label="Parts" />
      <Text variant="title">Import parts</Text>
      {team && canEditCatalogue(memberships, team.teamId) ? (
        <PartImportFlow teamId={team.teamId} teamName={team.teamName} />
      ) : (
        <EmptyState title="Read only" message="Reviewers read the parts library; owners and designers of the team import into it." />
      )}
    </Page>
  );
}
