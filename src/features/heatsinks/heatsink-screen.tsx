import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, errorStatus } from '@/api';
import { Button, Card, ConfirmRow, EmptyState, ErrorState, InlineAlert, LoadingState, Page, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { DemoBadge } from '@/features/catalogues/components/demo-badge';
import { canEditCatalogue } from '@/features/catalogues/permissions';
import { BackLink } from '@/features/studies/components/back-link';
import { FactGrid } from '@/features/studies/components/fact-grid';
import { formatDateTime } from '@/features/studies/format';
import { formatQuantity } from '@/features/studies/quantity-format';
import { useCurrentTeam } from '@/features/team/current-team';

import { useDeleteHeatsink, useHeatsink } from './api';
import { heatsinkFacts } from './heatsink-facts';

export type HeatsinkScreenProps = { id: string };

/** One heatsink with every value; owners and designers edit or delete it. */
export function HeatsinkScreen({ id }: HeatsinkScreenProps) {
  const router = useRouter();
  const { memberships } = useCurrentTeam();
  const heatsink = useHeatsink(id);
  const remove = useDeleteHeatsink();
  const [confirming, setConfirming] = useState(false);

  let body;
  if (heatsink.isPending) {
    body = <LoadingState label="Loading heatsink…" />;
  } else if (heatsink.isError && errorStatus(heatsink.error) === 404) {
    body = <EmptyState title="Heatsink not found" message="It may have been deleted, or it belongs to a team you are not a member of." />;
  } else if (heatsink.isError) {
    body = <ErrorState title="Could not load the heatsink" message={errorMessage(heatsink.error)} onRetry={() => heatsink.refetch()} retrying={heatsink.isFetching} />;
  } else {
    const h = heatsink.data;
    const canEdit = canEditCatalogue(memberships, h.teamId);
    body = (
      <>
        <View style={styles.heading}>
          {h.isDemo ? <DemoBadge /> : null}
          <Text variant="title">{h.name}</Text>
          {h.description ? <Text tone="muted">{h.description}</Text> : null}
        </View>
        {canEdit ? (
          <View style={styles.actions}>
            <Button label="Edit" onPress={() => router.push(`/heatsinks/${h.id}/edit`)} />
            <Button label="Delete" variant="secondary" onPress={() => setConfirming(true)} disabled={confirming} />
          </View>
        ) : null}
        {confirming ? (
          <ConfirmRow
            message={`Delete ${h.name} from the catalogue? Studies that copied its values keep them.`}
            confirmLabel="Delete heatsink"
            busy={remove.isPending}
            onCancel={() => setConfirming(false)}
            onConfirm={() => remove.mutate(h.id, { onSuccess: () => router.replace('/heatsinks') })}
          />
        ) : null}
        {remove.isError ? <InlineAlert message={errorMessage(remove.error)} /> : null}
        <Card>
          <FactGrid facts={heatsinkFacts(h)} />
        </Card>
        <Card>
          <Text variant="heading">Forced air</Text>
          {h.forcedAir.length === 0 ? (
            <Text tone="muted">No forced-air values: still air only.</Text>
          ) : (
            <View role="list" style={styles.points}>
              {[...h.forcedAir]
                .sort((a, b) => a.airSpeedMPerS - b.airSpeedMPerS)
                .map((p) => (
                  <Text key={p.airSpeedMPerS} role="listitem">
                    Rθsa {formatQuantity(p.rthKPerW, 'K/W')} at {formatQuantity(p.airSpeedMPerS, 'm/s')}
                  </Text>
                ))}
            </View>
          )}
        </Card>
        {h.notes ? (
          <Card>
            <Text variant="heading">Notes</Text>
            <Text>{h.notes}</Text>
          </Card>
        ) : null}
        <Text variant="caption" tone="faint">
          Updated {formatDateTime(h.updatedAt)}
        </Text>
      </>
    );
  }

  return (
    <Page width="readable">
      <BackLink href="/heatsinks" label="Heatsinks" />
      {body}
    </Page>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  points: { gap: spacing.xxs },
});
