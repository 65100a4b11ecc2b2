import { useRouter } from 'expo-router';

import { errorMessage } from '@/api';
import { Card, EmptyState, ErrorState, LoadingState, Page, Text } from '@/components/ui';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { BackLink } from '@/features/studies/components/back-link';
import { useCurrentTeam } from '@/features/team/current-team';

import { useHeatsink } from './api';
import { HeatsinkForm } from './components/heatsink-form';
import { emptyHeatsinkValues, heatsinkValues } from './heatsink-form-values';

const READ_ONLY = 'Reviewers read the catalogue; owners and designers of the team edit it.';

/** A new heatsink in the current team. */
export function NewHeatsinkScreen() {
  const router = useRouter();
  const { team, memberships } = useCurrentTeam();
  const canEdit = canEditCatalogue(memberships, team?.teamId);
  return (
    <Page width="readable">
      <BackLink href="/heatsinks" label="Heatsinks" />
      <Text variant="title">New heatsink</Text>
      {canEdit && team ? (
        <Card>
          <Text tone="muted">Adds to the catalogue of {team.teamName}.</Text>
          <HeatsinkForm
            initial={emptyHeatsinkValues()}
            teamId={team.teamId}
            onSaved={(h) => router.replace(`/heatsinks/${h.id}`)}
            onCancel={() => router.back()}
          />
        </Card>
      ) : (
        <EmptyState title="Read only" message={READ_ONLY} />
      )}
    </Page>
  );
}

export type EditHeatsinkScreenProps = { id: string };

export function EditHeatsinkScreen({ id }: EditHeatsinkScreenProps) {
  const router = useRouter();
  const { memberships } = useCurrentTeam();
  const heatsink = useHeatsink(id);
  let body;
  if (heatsink.isPending) body = <LoadingState label="Loading heatsink…" />;
  else if (heatsink.isError) body = <ErrorState title="Could not load the heatsink" message={errorMessage(heatsink.error)} onRetry={() => heatsink.refetch()} retrying={heatsink.isFetching} />;
  else if (!canEditCatalogue(memberships, heatsink.data.teamId)) body = <EmptyState title="Read only" message={READ_ONLY} />;
  else
    body = (
      <Card>
        <HeatsinkForm
          initial={heatsinkValues(heatsink.data)}
          id={heatsink.data.id}
          onSaved={(h) => router.replace(`/heatsinks/${h.id}`)}
          onCancel={() => router.back()}
        />
      </Card>
    );
  return (
    <Page width="readable">
      <BackLink href={`/heatsinks/${id}`} label={heatsink.data?.name ?? 'Heatsink'} />
      <Text variant="title">Edit heatsink</Text>
      {body}
    </Page>
  );
}
