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

import { useDeleteInterfaceMaterial, useInterfaceMaterial } from './api';
import { areaResistanceKCm2PerW, KIND_LABELS } from './interface-format';
import type { InterfaceMaterial } from './types';

const value = (v: number | null, unit: string) => (v === null ? '—' : formatQuantity(v, unit));

function facts(m: InterfaceMaterial) {
  if (m.kind === 'per_package') {
    return [
      { label: 'Kind', value: KIND_LABELS[m.kind] },
      { label: 'Package', value: m.packageName ?? '—' },
      { label: 'Rθcs', value: value(m.rthKPerW, 'K/W') },
    ];
  }
  return [
    { label: 'Kind', value: KIND_LABELS[m.kind] },
    { label: 'Conductivity', value: value(m.conductivityWPerMK, 'W/(m·K)') },
    { label: 'Thickness', value: value(m.thicknessMm, 'mm') },
    { label: 'Contact resistance', value: value(m.contactKCm2PerW, 'K·cm²/W') },
    { label: 'Resistance of 1 cm²', value: value(areaResistanceKCm2PerW(m), 'K·cm²/W') },
  ];
}

export type InterfaceMaterialScreenProps = { id: string };

export function InterfaceMaterialScreen({ id }: InterfaceMaterialScreenProps) {
  const router = useRouter();
  const { memberships } = useCurrentTeam();
  const material = useInterfaceMaterial(id);
  const remove = useDeleteInterfaceMaterial();
  const [confirming, setConfirming] = useState(false);

  let body;
  if (material.isPending) body = <LoadingState label="Loading interface material…" />;
  else if (material.isError && errorStatus(material.error) === 404)
    body = <EmptyState title="Interface material not found" message="It may have been deleted, or it belongs to a team you are not a member of." />;
  else if (material.isError)
    body = <ErrorState title="Could not load the interface material" message={errorMessage(material.error)} onRetry={() => material.refetch()} retrying={material.isFetching} />;
  else {
    const m = material.data;
    const canEdit = canEditCatalogue(memberships, m.teamId);
    body = (
      <>
        <View style={styles.heading}>
          {m.isDemo ? <DemoBadge /> : null}
          <Text variant="title">{m.name}</Text>
        </View>
        {canEdit ? (
          <View style={styles.actions}>
            <Button label="Edit" onPress={() => router.push(`/interface-materials/${m.id}/edit`)} />
            <Button label="Delete" variant="secondary" onPress={() => setConfirming(true)} disabled={confirming} />
          </View>
        ) : null}
        {confirming ? (
          <ConfirmRow
            message={`Delete ${m.name} from the catalogue? Studies that copied its values keep them.`}
            confirmLabel="Delete material"
            busy={remove.isPending}
            onCancel={() => setConfirming(false)}
            onConfirm={() => remove.mutate(m.id, { onSuccess: () => router.replace('/interface-materials') })}
          />
        ) : null}
        {remove.isError ? <InlineAlert message={errorMessage(remove.error)} /> : null}
        <Card>
          <FactGrid facts={facts(m)} />
        </Card>
        {m.notes ? (
          <Card>
            <Text variant="heading">Notes</Text>
            <Text>{m.notes}</Text>
          </Card>
        ) : null}
        <Text variant="caption" tone="faint">
          Updated {formatDateTime(m.updatedAt)}
        </Text>
      </>
    );
  }
  return (
    <Page width="readable">
      <BackLink href="/interface-materials" label="Interface materials" />
      {body}
    </Page>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
