import { memo } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import { useEditorActions } from '../editor-context';
import { at } from '../field-path';
import type { RawObject, RawPoint } from '../types';
import { ChoiceRow } from './choice-row';
import { PointList } from './point-list';
import { QuantityField } from './quantity-field';

type Electrical = RawObject & {
  role?: string;
  iqA?: unknown;
  dropout?: { points?: RawPoint[] };
  currentLimit?: { points?: RawPoint[] };
  thermalShutdown?: { tripC?: unknown; hysteresisK?: unknown };
  adjustable?: { vrefV?: unknown; r1Ohm?: unknown; r2Ohm?: unknown; iadjA?: unknown };
};

const ROLES = [
  { value: 'pass', label: 'Pass device' },
  { value: 'other', label: 'Other' },
] as const;

const DROPOUT = [
  { key: 'currentA', label: 'I', kind: 'current' },
  { key: 'voltageV', label: 'Vdrop', kind: 'voltage' },
] as const;
const LIMIT = [
  { key: 'differentialV', label: 'Vin − Vout', kind: 'voltage' },
  { key: 'currentA', label: 'Ilim', kind: 'current' },
] as const;

export type ElectricalFieldsProps = { field: string; electrical: Electrical | undefined; owner: string };

/** Quiescent current, dropout and current-limit curves, thermal shutdown, adjustable divider. */
export const ElectricalFields = memo(function ElectricalFields({ field, electrical, owner }: ElectricalFieldsProps) {
  const { set } = useEditorActions();
  if (!electrical) {
    return (
      <View style={styles.box}>
        <Text tone="muted">No electrical model: segments with Vin, Vout and Iload dissipate (Vin − Vout) · I in this device, without dropout or limits.</Text>
        <Button label="Add electrical model" variant="secondary" accessibilityLabel={`Add ${owner} electrical model`} onPress={() => set(field, {})} style={styles.button} />
      </View>
    );
  }
  const shutdown = electrical.thermalShutdown;
  return (
    <View style={styles.box}>
      <View style={styles.row}>
        <ChoiceRow label="Fed by electrical segments" value={electrical.role === 'other' ? 'other' : 'pass'} options={ROLES} onChange={(role) => set(at(field, 'role'), role === 'pass' ? undefined : role)} />
      </View>
      <View style={styles.row}>
        <QuantityField field={at(field, 'iqA')} value={electrical.iqA} kind="current" label="Iq" fullLabel={`${owner} Iq`} optional placeholder="0 A" hint="Input current that does not reach the load." />
      </View>
      <Curve field={at(field, 'dropout')} curve={electrical.dropout} title="Dropout against current" columns={DROPOUT} owner={`${owner} dropout`} />
      <Curve field={at(field, 'currentLimit')} curve={electrical.currentLimit} title="Current limit against Vin − Vout" columns={LIMIT} owner={`${owner} current limit`} />
      <View style={styles.group}>
        <Text variant="label" tone="muted">
          Thermal shutdown
        </Text>
        {shutdown ? (
          <View style={styles.row}>
            <QuantityField field={at(at(field, 'thermalShutdown'), 'tripC')} value={shutdown.tripC} kind="temperature" label="Trip" fullLabel={`${owner} shutdown trip`} />
            <QuantityField field={at(at(field, 'thermalShutdown'), 'hysteresisK')} value={shutdown.hysteresisK} kind="temperatureDifference" label="Hysteresis" fullLabel={`${owner} shutdown hysteresis`} />
            <Button label="Remove" variant="ghost" accessibilityLabel={`Remove ${owner} thermal shutdown`} onPress={() => set(at(field, 'thermalShutdown'), undefined)} />
          </View>
        ) : (
          <Button label="Add thermal shutdown" variant="secondary" accessibilityLabel={`Add ${owner} thermal shutdown`} onPress={() => set(at(field, 'thermalShutdown'), { tripC: '', hysteresisK: '' })} style={styles.button} />
        )}
      </View>
      {electrical.adjustable ? (
        <View style={styles.group}>
          <Text variant="label" tone="muted">
            Adjustable divider: Vout = Vref (1 + R2/R1) + Iadj·R2
          </Text>
          <View style={styles.row}>
            <QuantityField field={at(at(field, 'adjustable'), 'vrefV')} value={electrical.adjustable.vrefV} kind="voltage" label="Vref" fullLabel={`${owner} Vref`} optional />
            <QuantityField field={at(at(field, 'adjustable'), 'r1Ohm')} value={electrical.adjustable.r1Ohm} kind="resistance" label="R1" fullLabel={`${owner} R1`} />
            <QuantityField field={at(at(field, 'adjustable'), 'r2Ohm')} value={electrical.adjustable.r2Ohm} kind="resistance" label="R2" fullLabel={`${owner} R2`} />
            <QuantityField field={at(at(field, 'adjustable'), 'iadjA')} value={electrical.adjustable.iadjA} kind="current" label="Iadj" fullLabel={`${owner} Iadj`} optional />
          </View>
        </View>
      ) : null}
      <Button label="Remove electrical model" variant="ghost" accessibilityLabel={`Remove ${owner} electrical model`} onPress={() => set(field, undefined)} style={styles.button} />
    </View>
  );
});

type CurveProps = { field: string; curve: { points?: RawPoint[] } | undefined; title: string; columns: typeof DROPOUT | typeof LIMIT; owner: string };

/** A curve the format holds as `{ points }`; with no points it is left out (none). */
function Curve({ field, curve, title, columns, owner }: CurveProps) {
  const { set } = useEditorActions();
  if (!curve) {
    return (
      <View style={styles.group}>
        <Text variant="label" tone="muted">
          {title}
        </Text>
        <Button
          label="Add curve"
          variant="secondary"
          accessibilityLabel={`Add ${owner} curve`}
          onPress={() => set(field, { points: [Object.fromEntries(columns.map((c) => [c.key, '']))] })}
          style={styles.button}
        />
      </View>
    );
  }
  return (
    <View style={styles.group}>
      <PointList field={at(field, 'points')} points={curve.points} columns={columns} noun="point" owner={owner} title={`${title} (linear between points, flat beyond)`} />
      <Button label="Remove curve" variant="ghost" accessibilityLabel={`Remove ${owner} curve`} onPress={() => set(field, undefined)} style={styles.button} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: spacing.md },
  group: { gap: spacing.sm, paddingTop: spacing.sm, borderTopWidth: 1, borderTopColor: color.border },
  button: { alignSelf: 'flex-start' },
});
