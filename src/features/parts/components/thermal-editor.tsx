import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { ZthChart } from '@/charts/zth-chart';
import { zthCurve, zthEquivalent, zthTimeSpan, type ZthPoint } from '@/charts/zth-model';
import { spacing } from '@/constants/theme';

import type { CauerRow, FosterRow, ThermalValues } from '../part-form-values';
import { readThermal } from '../part-input';
import type { ZthFitResponse } from '../types';
import { switchThermalKind } from '../thermal-switch';
import { ChoiceChips } from './choice-chips';
import { FOSTER_NOTE } from './thermal-model-view';
import { NumberField } from './number-field';
import { RowList } from './row-list';
import { ZthFitPanel } from './zth-fit-panel';

const KINDS = [
  { value: 'foster', label: 'Foster terms' },
  { value: 'cauer', label: 'Cauer stages' },
  { value: 'lumped', label: 'One Rθjc' },
] as const;

const FOSTER_COLUMNS = [
  { key: 'rKPerW', label: 'R', unit: 'K/W' },
  { key: 'tauS', label: 'τ', unit: 's', hint: 'With a prefix if you like: 2 ms, 800 µs.' },
] as const;
const CAUER_COLUMNS = [
  { key: 'rKPerW', label: 'R', unit: 'K/W' },
  { key: 'capacityJPerK', label: 'C', unit: 'J/K' },
] as const;

export type ThermalEditorProps = {
  value: ThermalValues;
  onChange: (value: ThermalValues) => void;
  zthPoints: ZthPoint[] | null;
  /** A fit was taken into the model: its terms, points and residual. */
  onUseFit: (fit: ZthFitResponse) => void;
  onRemovePoints: () => void;
};

/** The junction-to-case model: its form, its rows, a live Zth(t) preview and the fit from a Zth CSV. */
export function ThermalEditor({ value, onChange, zthPoints, onUseFit, onRemovePoints }: ThermalEditorProps) {
  const [note, setNote] = useState<string | null>(null);
  const model = useMemo(() => readThermal(value), [value]);
  const preview = useMemo(() => {
    if (!model) return null;
    try {
      const eq = zthEquivalent(model);
      return zthCurve(eq, zthTimeSpan(eq, zthPoints ?? []));
    } catch {
      return null;
    }
  }, [model, zthPoints]);

  const edit = (next: ThermalValues) => {
    setNote(null);
    onChange(next);
  };

  return (
    <View style={styles.editor}>
      <ChoiceChips
        label="Model"
        value={value.kind}
        options={KINDS}
        onChange={(kind) => {
          const { next, note: said } = switchThermalKind(value, kind);
          onChange(next);
          setNote(said);
        }}
      />
      {note ? (
        <Text variant="caption" tone="muted" role="status">
          {note}
        </Text>
      ) : null}
      {value.kind === 'foster' ? (
        <>
          <RowList<FosterRow> title="Foster terms" item="term" rows={value.terms} columns={FOSTER_COLUMNS} path="thermal.terms" blank={{ rKPerW: '', tauS: '' }} minRows={1} onChange={(terms) => edit({ ...value, terms })} />
          <Text variant="caption" tone="faint">
            {FOSTER_NOTE}
          </Text>
        </>
      ) : null}
      {value.kind === 'cauer' ? (
        <RowList<CauerRow> title="Cauer stages, junction first" item="stage" rows={value.stages} columns={CAUER_COLUMNS} path="thermal.stages" blank={{ rKPerW: '', capacityJPerK: '' }} minRows={1} onChange={(stages) => edit({ ...value, stages })} />
      ) : null}
      {value.kind === 'lumped' ? (
        <View style={styles.row}>
          <NumberField label="Rθjc" unit="K/W" path="thermal.rthKPerW" value={value.rthKPerW} onChange={(rthKPerW) => edit({ ...value, rthKPerW })} />
          <NumberField label="Heat capacity at the junction" unit="J/K" path="thermal.capacityJPerK" value={value.capacityJPerK} hint="Optional; empty for none." onChange={(capacityJPerK) => edit({ ...value, capacityJPerK })} />
        </View>
      ) : null}

      {preview ? (
        <ZthChart label="Zth(t) of the model as entered" curve={{ label: 'Model as entered', points: preview }} points={zthPoints ?? []} height={240} />
      ) : (
        <Text variant="caption" tone="faint">
          The Zth(t) preview appears once every value reads as a positive number.
        </Text>
      )}
      {zthPoints?.length ? (
        <View style={styles.row}>
          <Text variant="caption" tone="muted" style={styles.grow}>
            {zthPoints.length} datasheet Zth points are kept with the part.
          </Text>
          <Button label="Remove the points" variant="ghost" onPress={onRemovePoints} />
        </View>
      ) : null}
      <ZthFitPanel current={preview} onUse={onUseFit} />
    </View>
  );
}

const styles = StyleSheet.create({
  editor: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
  grow: { flexGrow: 1, flexShrink: 1 },
});
