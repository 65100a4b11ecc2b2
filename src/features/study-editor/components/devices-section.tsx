import { memo } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

import { useEditorActions, useFieldError } from '../editor-context';
import { nextId } from '../list-edits';
import type { RawDevice, RawDocument } from '../types';
import { DeviceCard } from './device-card';

export type DevicesSectionProps = { document: RawDocument; teamId: number };

/** It reads only the devices and the sinks of the document: an edit elsewhere (the ambient, a long profile) leaves it as drawn. */
const sameDevicesAndSinks = (a: DevicesSectionProps, b: DevicesSectionProps) =>
  a.teamId === b.teamId && a.document.devices === b.document.devices && a.document.sinks === b.document.sinks;

/** The pass devices of the study, each a card; new ones start empty and mounted on the first sink. */
export const DevicesSection = memo(function DevicesSection({ document, teamId }: DevicesSectionProps) {
  const { update } = useEditorActions();
  const listError = useFieldError('document.devices');
  const devices = document.devices ?? [];
  const sinkIds = (document.sinks ?? []).map((s) => s.id ?? '').filter(Boolean);
  const ids = devices.map((d) => d.id ?? '');
  return (
    <View style={styles.box}>
      {devices.map((device, i) => (
        <DeviceCard key={i} device={device} index={i} count={devices.length} sinkIds={sinkIds} deviceIds={ids} teamId={teamId} />
      ))}
      {listError ? (
        <Text variant="caption" tone="danger" role="alert">
          {listError}
        </Text>
      ) : null}
      <Button
        label="Add device"
        variant="secondary"
        onPress={() =>
          update<RawDevice[] | undefined>('document.devices', (list) => [
            ...(list ?? []),
            { id: nextId('Q', ids), tjMaxC: '', sink: sinkIds[0] ?? '', package: { kind: 'lumped', rthKPerW: '' }, interface: { rthKPerW: '' } },
          ])
        }
        style={styles.add}
      />
    </View>
  );
}, sameDevicesAndSinks);

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  add: { alignSelf: 'flex-start' },
});
