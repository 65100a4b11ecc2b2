import { memo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { useLibraryParts } from '../api';
import { deviceFromPart, type LibraryPart } from '../catalogue-copy';
import { useEditorActions, useFieldError } from '../editor-context';
import { at } from '../field-path';
import { removeDevice, renameDevice } from '../id-refs';
import { moveItem, nextId } from '../list-edits';
import type { RawDevice, RawDocument } from '../types';
import { ChoiceRow } from './choice-row';
import { ElectricalFields } from './electrical-fields';
import { IdEntry } from './id-entry';
import { LibraryPicker } from './library-picker';
import { PackageFields } from './package-fields';
import { QuantityField } from './quantity-field';
import { RowActions } from './row-actions';
import { SoaFields } from './soa-fields';
import { TextEntry } from './text-entry';

const KINDS = [
  { value: '', label: 'Not given' },
  { value: 'regulator', label: 'Regulator' },
  { value: 'bipolar', label: 'Bipolar' },
  { value: 'darlington', label: 'Darlington' },
  { value: 'mosfet', label: 'MOSFET' },
] as const;

const packageTotal = (thermal: Record<string, unknown>): string => {
  if (thermal.kind === 'lumped') return `Rθjc ${String(thermal.rthKPerW)} K/W`;
  const rows = (thermal.terms ?? thermal.stages) as { rKPerW: number }[] | undefined;
  return rows ? `Rθjc ${Number(rows.reduce((s, r) => s + r.rKPerW, 0).toPrecision(3))} K/W (${String(thermal.kind)})` : String(thermal.kind);
};

export type DeviceCardProps = { device: RawDevice; index: number; count: number; sinkIds: string[]; deviceIds: string[]; teamId: number };

/** One device entry: what it is, where it sits, its package, interface, electrical model and SOA. */
export const DeviceCard = memo(function DeviceCard({ device, index, count, sinkIds, deviceIds, teamId }: DeviceCardProps) {
  const { set, update } = useEditorActions();
  const [picking, setPicking] = useState(false);
  const [copied, setCopied] = useState<string | null>(null);
  const parts = useLibraryParts(teamId, picking);
  const field = at('document.devices', index);
  const owner = device.id || `device ${index + 1}`;
  const sinkError = useFieldError(at(field, 'sink'));
  const updateDoc = (change: (doc: RawDocument) => RawDocument) => update<RawDocument>('document', change);

  return (
    <View style={styles.card} testID={`device-${index}`}>
      <View style={styles.head}>
        <Text variant="bodyStrong" style={styles.title}>
          {device.name || owner}{' '}
          <Text variant="mono" tone="faint">
            {device.id}
          </Text>
        </Text>
        <RowActions
          noun={`device ${owner}`}
          index={index}
          count={count}
          keepOne
          onMove={(by) => update<RawDevice[]>('document.devices', (list) => moveItem(list, index, by))}
          onDuplicate={() =>
            update<RawDevice[]>('document.devices', (list) => {
              const next = [...list];
              next.splice(index + 1, 0, { ...(JSON.parse(JSON.stringify(device)) as RawDevice), id: nextId('Q', deviceIds) });
              return next;
            })
          }
          onDelete={() => updateDoc((doc) => removeDevice(doc, index))}
        />
      </View>

      <View style={styles.row}>
        <IdEntry field={at(field, 'id')} value={device.id} label="Id" fullLabel={`Device ${index + 1} id`} onChange={(id) => updateDoc((doc) => renameDevice(doc, index, id))} />
        <TextEntry field={at(field, 'name')} value={device.name} label="Name" fullLabel={`${owner} name`} optional size="grow" />
      </View>
      <View style={styles.row}>
        <QuantityField field={at(field, 'tjMaxC')} value={device.tjMaxC} kind="temperature" label="Tj,max" fullLabel={`${owner} Tj,max`} />
        <QuantityField field={at(field, 'count')} value={device.count} kind="integer" label="In parallel" fullLabel={`${owner} count in parallel`} optional placeholder="1" hint="Identical parts sharing the current." />
      </View>
      <ChoiceRow
        label="Mounted on sink"
        value={device.sink ?? ''}
        options={sinkIds.map((id) => ({ value: id, label: id }))}
        onChange={(sink) => set(at(field, 'sink'), sink)}
        error={sinkError}
      />
      <ChoiceRow label="Kind" value={(device.kind ?? '') as (typeof KINDS)[number]['value']} options={KINDS} onChange={(kind) => set(at(field, 'kind'), kind === '' ? undefined : kind)} />

      <View style={styles.library}>
        {picking ? (
          <LibraryPicker<LibraryPart>
            title="Parts library"
            query={parts}
            empty="The team’s parts library is empty."
            describe={(p) => [p.kind, p.packageName, `Tj,max ${p.tjMaxC} °C`, packageTotal(p.thermal), p.soa ? 'SOA' : null].filter(Boolean).join(' · ')}
            renderChoice={(part) => (
              <Button
                label={`Copy into ${owner}`}
                onPress={() => {
                  set(field, deviceFromPart(device, part));
                  setCopied(part.name);
                  setPicking(false);
                }}
                style={styles.button}
              />
            )}
            onClose={() => setPicking(false)}
          />
        ) : (
          <Button label="From the parts library" variant="secondary" accessibilityLabel={`${owner} from the parts library`} onPress={() => setPicking(true)} style={styles.button} />
        )}
        {copied ? (
          <Text variant="caption" tone="muted">
            Copied from “{copied}”: package, electrical model, SOA and Tj,max. Later changes in the library do not reach this study.
          </Text>
        ) : null}
      </View>

      <Group title="Package">
        <PackageFields field={at(field, 'package')} pkg={device.package} owner={owner} />
      </Group>
      <Group title="Interface to the sink">
        <View style={styles.row}>
          <QuantityField field={at(at(field, 'interface'), 'rthKPerW')} value={device.interface?.rthKPerW} kind="thermalResistance" label="Rθcs" fullLabel={`${owner} Rθcs`} />
          <TextEntry field={at(at(field, 'interface'), 'material')} value={device.interface?.material} label="Material" fullLabel={`${owner} interface material`} optional />
        </View>
      </Group>
      <Group title="Electrical">
        <ElectricalFields field={at(field, 'electrical')} electrical={device.electrical} owner={owner} />
      </Group>
      <Group title="Safe operating area">
        <SoaFields field={at(field, 'soa')} device={device} owner={owner} />
      </Group>
    </View>
  );
});

function Group({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <View style={styles.group}>
      <Text variant="label" tone="muted" style={styles.groupTitle}>
        {title}
      </Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.border, backgroundColor: color.canvas },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  title: { flexShrink: 1 },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.md },
  library: { gap: spacing.xs },
  button: { alignSelf: 'flex-start' },
  group: { gap: spacing.sm, paddingTop: spacing.md, borderTopWidth: 1, borderTopColor: color.border },
  groupTitle: { textTransform: 'uppercase', letterSpacing: 0.6 },
});
