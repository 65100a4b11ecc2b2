import { useRouter } from 'expo-router';

import { errorMessage } from '@/api';
import { EmptyState, ErrorState, LoadingState, Page, Text } from '@/components/ui';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { BackLink } from '@/features/studies/components/back-link';
import { useCurrentTeam } from '@/features/team/current-team';

import { usePart } from './api';
import { PartForm } from './components/part-form';
import { emptyPartValues, partValues } from './part-form-values';

const READ_ONLY = 'Reviewers read the parts library; owners and designers of the team edit it.';

/** A new part in the current team. */
export function NewPartScreen() {
  const router = useRouter();
  const { team, memberships } = useCurrentTeam();
  const canEdit = canEditCatalogue(memberships, team?.teamId);
  return (
    <Page>
      <BackLink href="/parts" label="Parts" />
      <Text variant="title">New part</Text>
      {canEdit && team ? (
        <>
          <Text tone="muted">Adds to the parts library of {team.teamName}.</Text>
          <PartForm initial={emptyPartValues()} teamId={team.teamId} onSaved={(p) => router.replace(`/parts/${p.id}`)} onCancel={() => router.back()} />
        </>
      ) : (
        <EmptyState title="Read only" message={READ_ONLY} />
      )}
    </Page>
  );
}

export type EditPartScreenProps = { id: string };

export function EditPartScreen({ id }: EditPartScreenProps) {
  const router = useRouter();
  const { memberships } = useCurrentTeam();
  const part = usePart(id);
  let body;
  if (part.isPending) body = <LoadingState label="Loading part…" />;
  else if (part.isError) body = <ErrorState title="Could not load the part" message={errorMessage(part.error)} onRetry={() => part.refetch()} retrying={part.isFetching} />;
  else if (!canEditCatalogue(memberships, part.data.teamId)) body = <EmptyState title="Read only" message={READ_ONLY} />;
  else body = <PartForm initial={partValues(part.data)} id={part.data.id} onSaved={(p) => router.replace(`/parts/${p.id}`)} onCancel={() => router.back()} />;
  return (
    <Page>
      <BackLink href={`/parts/${id}`} label={part.data?.name ?? 'Part'} />
      <Text variant="title">Edit part</Text>
      {body}
    </Page>
  );
}
