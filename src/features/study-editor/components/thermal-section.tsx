import { memo } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import { useEditorActions, useFieldError } from '../editor-context';
import { nextId } from '../list-edits';
import type { RawDocument, RawSink } from '../types';
import { QuantityField } from './quantity-field';
import { SinkCard } from './sink-card';

export type ThermalSectionProps = { document: RawDocument; teamId: number };

/** It reads only the sinks and the enclosure of the document: an edit elsewhere leaves it as drawn. */
const sameSinksAndEnclosure = (a: ThermalSectionProps, b: ThermalSectionProps) =>
  a.teamId === b.teamId && a.document.sinks === b.document.sinks && a.document.enclosure === b.document.enclosure;

/** Sinks (each device sits on one), and the optional enclosure air between them and the room. */
export const ThermalSection = memo(function ThermalSection({ document, teamId }: ThermalSectionProps) {
  const { set, update } = useEditorActions();
  const listError = useFieldError('document.sinks');
  const sinks = document.sinks ?? [];
  const ids = sinks.map((s) => s.id ?? '');
  const enclosure = document.enclosure;
  return (
    <View style={styles.box}>
      {sinks.map((sink, i) => (
        <SinkCard key={i} sink={sink} index={i} count={sinks.length} sinkIds={ids} hasEnclosure={Boolean(enclosure)} teamId={teamId} />
      ))}
      {listError ? (
        <Text variant="caption" tone="danger" role="alert">
          {listError}
        </Text>
      ) : null}
      <Button
        label="Add sink"
        variant="secondary"
        onPress={() => update<RawSink[] | undefined>('document.sinks', (list) => [...(list ?? []), { id: nextId('S', ids), rthKPerW: '' }])}
        style={styles.button}
      />
      <View style={styles.enclosure}>
        <Text variant="label" tone="muted" style={styles.title}>
          Enclosure
        </Text>
        {enclosure ? (
          <>
            <Text variant="caption" tone="muted">
              Air inside a housing: sinks lead to it unless their Rθsa leads elsewhere.
            </Text>
            <View style={styles.row}>
              <QuantityField field="document.enclosure.rthKPerW" value={enclosure.rthKPerW} kind="thermalResistance" label="Rθ to the room" fullLabel="Enclosure Rθ to the room" />
              <QuantityField field="document.enclosure.capacityJPerK" value={enclosure.capacityJPerK} kind="heatCapacity" label="Heat capacity" fullLabel="Enclosure heat capacity" optional placeholder="none" hint="Air and walls; empty: none." />
            </View>
            <Button label="Remove enclosure" variant="ghost" onPress={() => set('document.enclosure', undefined)} style={styles.button} />
          </>
        ) : (
          <>
            <Text tone="muted">No enclosure: the sinks shed into the room air.</Text>
            <Button label="Add enclosure" variant="secondary" onPress={() => set('document.enclosure', { rthKPerW: '' })} style={styles.button} />
          </>
        )}
      </View>
    </View>
  );
}, sameSinksAndEnclosure);

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.md },
  button: { alignSelf: 'flex-start' },
  enclosure: { gap: spacing.sm, paddingTop: spacing.md, borderTopWidth: 1, borderTopColor: color.border },
  title: { textTransform: 'uppercase', letterSpacing: 0.6 },
});
