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

import { useDeletePart, usePart } from './api';
import { ElectricalView } from './components/electrical-view';
import { SoaView } from './components/soa-view';
import { ThermalModelView } from './components/thermal-model-view';
import { KIND_LABEL, rthJcKPerW, thermalLabel } from './part-format';
import type { Part } from './types';

const facts = (p: Part) => [
  { label: 'Kind', value: KIND_LABEL[p.kind] },
  { label: 'Package', value: p.packageName || '—' },
  { label: 'Tj,max', value: formatQuantity(p.tjMaxC, '°C') },
  { label: 'Rθjc', value: formatQuantity(rthJcKPerW(p.thermal), 'K/W') },
  { label: 'Thermal model', value: thermalLabel(p.thermal) },
  { label: 'Models', value: [p.electrical ? 'electrical' : null, p.soa ? 'SOA' : null].filter(Boolean).join(', ') || 'thermal only' },
];

export type PartScreenProps = { id: string };

/** One part with every value, its Zth(t) and SOA charts; owners and designers edit or delete it. */
export function PartScreen({ id }: PartScreenProps) {
  const router = useRouter();
  const { memberships } = useCurrentTeam();
  const part = usePart(id);
  const remove = useDeletePart();
  const [confirming, setConfirming] = useState(false);

  let body;
  if (part.isPending) {
    body = <LoadingState label="Loading part…" />;
  } else if (part.isError && errorStatus(part.error) === 404) {
    body = <EmptyState title="Part not found" message="It may have been deleted, or it belongs to a team you are not a member of." />;
  } else if (part.isError) {
    body = <ErrorState title="Could not load the part" message={errorMessage(part.error)} onRetry={() => part.refetch()} retrying={part.isFetching} />;
  } else {
    const p = part.data;
    const canEdit = canEditCatalogue(memberships, p.teamId);
    body = (
      <>
        <View style={styles.heading}>
          {p.isDemo ? <DemoBadge /> : null}
          <Text variant="title">{p.name}</Text>
          {p.description ? <Text tone="muted">{p.description}</Text> : null}
        </View>
        {canEdit ? (
          <View style={styles.actions}>
            <Button label="Edit" onPress={() => router.push(`/parts/${p.id}/edit`)} />
            <Button label="Delete" variant="secondary" onPress={() => setConfirming(true)} disabled={confirming} />
          </View>
        ) : null}
        {confirming ? (
          <ConfirmRow
            message={`Delete ${p.name} from the library? Studies that copied its values keep them.`}
            confirmLabel="Delete part"
            busy={remove.isPending}
            onCancel={() => setConfirming(false)}
            onConfirm={() => remove.mutate(p.id, { onSuccess: () => router.replace('/parts') })}
          />
        ) : null}
        {remove.isError ? <InlineAlert message={errorMessage(remove.error)} /> : null}
        <Card>
          <FactGrid facts={facts(p)} />
        </Card>
        <Card>
          <Text variant="heading">Thermal model, junction to case</Text>
          <ThermalModelView model={p.thermal} zthPoints={p.zthPoints} zthFit={p.zthFit} />
        </Card>
        <Card>
          <Text variant="heading">Electrical model</Text>
          {p.electrical ? <ElectricalView electrical={p.electrical} /> : <Text tone="muted">None: no quiescent current, dropout or current limit.</Text>}
        </Card>
        <Card>
          <Text variant="heading">Safe operating area</Text>
          {p.soa ? (
            <SoaView soa={p.soa} />
          ) : (
            <Text tone="muted">{p.kind === 'regulator' ? 'An integrated regulator protects itself (current limit, shutdown): no SOA model.' : 'No SOA model: a study cannot check this part’s operating points.'}</Text>
          )}
        </Card>
        {p.notes ? (
          <Card>
            <Text variant="heading">Notes</Text>
            <Text>{p.notes}</Text>
          </Card>
        ) : null}
        <Text variant="caption" tone="faint">
          Updated {formatDateTime(p.updatedAt)}
        </Text>
      </>
    );
  }

  return (
    <Page>
      <BackLink href="/parts" label="Parts" />
      {body}
    </Page>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
