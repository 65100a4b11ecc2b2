import { EmptyState, Page, Text } from '@/components/ui';
import { ImportFlow } from '@/features/catalogues/components/import-flow';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { BackLink } from '@/features/studies/components/back-link';
import { useCurrentTeam } from '@/features/team/current-team';

export function InterfaceImportScreen() {
  const { team, memberships } = useCurrentTeam();
  return (
    <Page width="content">
      <BackLink href="/interface-materials" label="Interface materials" />
      <Text variant="title">Import interface materials</Text>
      {team && canEditCatalogue(memberships, team.teamId) ? (
        <ImportFlow resource="interface-materials" noun="interface materials" teamId={team.teamId} teamName={team.teamName} libraryHref="/interface-materials" />
      ) : (
        <EmptyState title="Read only" message="Reviewers read the catalogue; owners and designers of the team import into it." />
      )}
    </Page>
  );
}
