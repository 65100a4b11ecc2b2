import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { SoaCsvPanel } from '@/components/soa-csv-panel';
import { Button, Text } from '@/components/ui';
import { partSoaChart } from '@/charts/soa-boundaries';
import { SoaChart } from '@/charts/soa-chart';
import { spacing } from '@/constants/theme';

import { curveRows, type PartFormValues, type SoaValues } from '../part-form-values';
import { readSoa } from '../part-input';
import { readField } from '../quantity-text';
import type { SoaJson, TransistorKind } from '../types';
import { ChoiceChips } from './choice-chips';
import { NumberField } from './number-field';
import { SoaCurvesEditor } from './soa-curves-editor';

const KINDS = [
  { value: 'parameters', label: 'Parameters' },
  { value: 'points', label: 'Datasheet curves' },
] as const;

const LINEAR = [
  { value: 'none', label: 'Not given' },
  { value: 'dc-rated', label: 'DC rated' },
  { value: 'not-rated', label: 'DC not rated' },
] as const;

export type SoaEditorProps = {
  values: PartFormValues;
  value: SoaValues;
  transistor: TransistorKind;
  onChange: (value: SoaValues) => void;
  onRemove: () => void;
};

/** The SOA model: parameters or datasheet curves, pulses and linear mode, with a live boundary chart. */
export function SoaEditor({ values, value: s, transistor, onChange, onRemove }: SoaEditorProps) {
  const set = (next: Partial<SoaValues>) => onChange({ ...s, ...next });
  const chart = useMemo(() => {
    const soa = readSoa(values);
    return soa ? partSoaChart(soa as SoaJson) : null;
  }, [values]);
  const zthOptions = [
    { value: 'none', label: 'None' },
    { value: 'thermal', label: 'From the thermal model' },
    ...(s.kept.zthJc ? [{ value: 'stored', label: `As stored (${s.kept.zthJc.length} terms)` }] : []),
  ] as { value: SoaValues['zthJc']; label: string }[];
  const tj = readField(s.tjMaxC, 'temperature');

  return (
    <View style={styles.editor}>
      <ChoiceChips label="Given as" value={s.kind} options={KINDS} onChange={(kind) => set({ kind, curves: kind === 'points' && s.curves.length === 0 ? [{ pulse: 'dc', points: [{ vceV: '', icA: '' }] }] : s.curves })} />
      <View style={styles.row}>
        <NumberField label="Tj,max of the thermal line" unit="°C" path="soa.tjMaxC" value={s.tjMaxC} hint="Usually the part’s Tj,max." onChange={(tjMaxC) => set({ tjMaxC })} />
      </View>
      {s.kind === 'parameters' ? (
        <>
          <View style={styles.row}>
            <NumberField label="Ic,max" unit="A" path="soa.icMaxA" value={s.icMaxA} onChange={(icMaxA) => set({ icMaxA })} />
            <NumberField label="Peak pulse current" unit="A" path="soa.icPulseMaxA" value={s.icPulseMaxA} hint="Optional." onChange={(icPulseMaxA) => set({ icPulseMaxA })} />
            <NumberField label="Vceo" unit="V" path="soa.vceoV" value={s.vceoV} onChange={(vceoV) => set({ vceoV })} />
            <NumberField label="Rθjc of the thermal line" unit="K/W" path="soa.rthJcKPerW" value={s.rthJcKPerW} onChange={(rthJcKPerW) => set({ rthJcKPerW })} />
          </View>
          <View style={styles.block}>
            <Text variant="label" tone="muted">
              Second breakdown, Is/b = I0 (Vce / V0)^(−n)
            </Text>
            {s.secondBreakdown ? (
              <View style={styles.row}>
                <NumberField label="V0" unit="V" path="soa.secondBreakdown.referenceVceV" value={s.sbVceV} onChange={(sbVceV) => set({ sbVceV })} />
                <NumberField label="I0 at V0" unit="A" path="soa.secondBreakdown.referenceIcA" value={s.sbIcA} onChange={(sbIcA) => set({ sbIcA })} />
                <NumberField label="Exponent n" path="soa.secondBreakdown.exponent" value={s.sbExponent} hint="Above 1; about 1.5–4." onChange={(sbExponent) => set({ sbExponent })} />
                {s.kept.sbDerating ? (
                  <Text tone="muted">Derating: {s.kept.sbDerating.kind === 'points' ? `${s.kept.sbDerating.points.length} datasheet points, kept` : 'kept'}</Text>
                ) : (
                  <NumberField label="Derating" unit="% per K" path="soa.secondBreakdown.derating" value={s.sbDeratingPctPerK} hint="Current lost per K above 25 °C; 0 for none." onChange={(sbDeratingPctPerK) => set({ sbDeratingPctPerK })} />
                )}
                <Button label="No second breakdown" variant="ghost" onPress={() => set({ secondBreakdown: false })} />
              </View>
            ) : (
              <Button label="Add second breakdown" variant="ghost" style={styles.start} onPress={() => set({ secondBreakdown: true })} />
            )}
          </View>
        </>
      ) : (
        <SoaCurvesEditor curves={s.curves} onChange={(curves) => set({ curves })} />
      )}
      <ChoiceChips label="Zθjc for pulses" value={s.zthJc} options={zthOptions} onChange={(zthJc) => set({ zthJc })} />
      {transistor === 'mosfet' ? (
        <View style={styles.block}>
          <ChoiceChips label="Linear-mode rating" value={s.linearMode} options={LINEAR} onChange={(linearMode) => set({ linearMode })} />
          {s.linearMode === 'not-rated' ? (
            <View style={styles.row}>
              <NumberField label="Longest pulse rated in linear mode" unit="s" path="soa.linearMode.longestRatedPulseS" value={s.longestPulse} hint="Optional, e.g. 10 ms." onChange={(longestPulse) => set({ longestPulse })} />
            </View>
          ) : null}
        </View>
      ) : null}

      {chart && chart.error === null ? (
        <SoaChart boundaries={chart.boundaries} label="SOA boundaries of the model as entered" height={280} />
      ) : (
        <Text variant="caption" tone="faint">
          {chart?.error ? `No chart yet: ${chart.error}` : 'The SOA chart appears once every value reads as a number.'}
        </Text>
      )}
      <SoaCsvPanel
        transistor={transistor}
        tjMaxC={tj.ok ? tj.value : null}
        onUse={(curves) => set({ kind: 'points', curves: curveRows(curves) })}
      />
      <Button label="Remove the SOA model" variant="secondary" style={styles.start} onPress={onRemove} />
    </View>
  );
}

const styles = StyleSheet.create({
  editor: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.sm },
  block: { gap: spacing.xs },
  start: { alignSelf: 'flex-start' },
});
