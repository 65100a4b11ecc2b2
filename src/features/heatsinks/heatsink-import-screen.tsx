import { EmptyState, Page, Text } from '@/components/ui';
import { ImportFlow } from '@/features/catalogues/components/import-flow';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { BackLink } from '@/features/studies/components/back-link';
import { useCurrentTeam } from '@/features/team/current-team';

/** Import a vendor table of heatsinks from CSV into the current team's catalogue. */
export function HeatsinkImportScreen() {
  const { team, memberships } = useCurrentTeam();
  return (
    <Page width="content">
      <BackLink href="/heatsinks" label="Heatsinks" />
      <Text variant="title">Import heatsinks</Text>
      {team && canEditCatalogue(memberships, team.teamId) ? (
        <ImportFlow resource="heatsinks" noun="heatsinks" teamId={team.teamId} teamName={team.teamName} withForcedAir libraryHref="/heatsinks" />
      ) : (
        <EmptyState title="Read only" message="Reviewers read the catalogue; owners and designers of the team import into it." />
      )}
    </Page>
  );
}
