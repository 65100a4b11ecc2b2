import { useRouter } from 'expo-router';

import { errorMessage } from '@/api';
import { Card, EmptyState, ErrorState, LoadingState, Page, Text } from '@/components/ui';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { BackLink } from '@/features/studies/components/back-link';
import { useCurrentTeam } from '@/features/team/current-team';

import { useInterfaceMaterial } from './api';
import { InterfaceForm } from './components/interface-form';
import { emptyInterfaceValues, interfaceValues } from './interface-form-values';

const READ_ONLY = 'Reviewers read the catalogue; owners and designers of the team edit it.';

export function NewInterfaceMaterialScreen() {
  const router = useRouter();
  const { team, memberships } = useCurrentTeam();
  return (
    <Page width="readable">
      <BackLink href="/interface-materials" label="Interface materials" />
      <Text variant="title">New interface material</Text>
      {team && canEditCatalogue(memberships, team.teamId) ? (
        <Card>
          <Text tone="muted">Adds to the catalogue of {team.teamName}.</Text>
          <InterfaceForm
            initial={emptyInterfaceValues()}
            teamId={team.teamId}
            onSaved={(m) => router.replace(`/interface-materials/${m.id}`)}
            onCancel={() => router.back()}
          />
        </Card>
      ) : (
        <EmptyState title="Read only" message={READ_ONLY} />
      )}
    </Page>
  );
}

export function EditInterfaceMaterialScreen({ id }: { id: string }) {
  const router = useRouter();
  const { memberships } = useCurrentTeam();
  const material = useInterfaceMaterial(id);
  let body;
  if (material.isPending) body = <LoadingState label="Loading interface material…" />;
  else if (material.isError) body = <ErrorState title="Could not load the interface material" message={errorMessage(material.error)} onRetry={() => material.refetch()} retrying={material.isFetching} />;
  else if (!canEditCatalogue(memberships, material.data.teamId)) body = <EmptyState title="Read only" message={READ_ONLY} />;
  else
    body = (
      <Card>
        <InterfaceForm
          initial={interfaceValues(material.data)}
          id={material.data.id}
          onSaved={(m) => router.replace(`/interface-materials/${m.id}`)}
          onCancel={() => router.back()}
        />
      </Card>
    );
  return (
    <Page width="readable">
      <BackLink href={`/interface-materials/${id}`} label={material.data?.name ?? 'Interface material'} />
      <Text variant="title">Edit interface material</Text>
      {body}
    </Page>
  );
}
