import { useFormik } from 'formik';
import { StyleSheet, View } from 'react-native';
import * as yup from 'yup';

import { Button, Text, TextField } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { quantityText, schemaErrors, targetSchema, valueOf } from '../helper-schemas';
import { pulseTrain } from '../profile-helpers';
import type { RawGroup } from '../types';
import { levelKind, levelTarget, levelUnit, LevelTargetFields } from './level-target';

type Values = { target: string; vin: string; vout: string; onLevel: string; offLevel: string; onS: string; offS: string; count: string };

/** Largest pulse count offered: the format expands a profile to at most 10,000,000 segments. */
const MAX_PULSES = 1_000_000;

const schema = (railPlan: boolean, target: string) =>
  yup.object({
    ...targetSchema(railPlan),
    onLevel: quantityText(levelKind(target), { min: 0 }),
    offLevel: quantityText(levelKind(target), { min: 0 }),
    onS: quantityText('time', { above: 0 }),
    offS: quantityText('time', { min: 0 }),
    count: quantityText('integer', { min: 1, max: MAX_PULSES }),
  });

export type PulseTrainFormProps = { deviceIds: string[]; railPlan: boolean; held: { vin: string; vout: string }; onAppend: (group: RawGroup) => void; onClose: () => void };

/** On and off levels, on and off times and a count: appended as one repeated group. */
export function PulseTrainForm({ deviceIds, railPlan, held, onAppend, onClose }: PulseTrainFormProps) {
  const form = useFormik<Values>({
    initialValues: { target: 'current', vin: held.vin, vout: held.vout, onLevel: '', offLevel: '0', onS: '', offS: '', count: '10' },
    validate: (values) => schemaErrors(schema(railPlan, values.target), values),
    onSubmit: (values) => {
      const kind = levelKind(values.target);
      onAppend(
        pulseTrain(levelTarget(values, railPlan), {
          onLevel: valueOf(values.onLevel, kind),
          offLevel: valueOf(values.offLevel, kind),
          onS: valueOf(values.onS, 'time'),
          offS: valueOf(values.offS, 'time'),
          count: valueOf(values.count, 'integer'),
        }),
      );
    },
  });
  const err = (key: keyof Values) => (form.submitCount > 0 ? form.errors[key] : undefined);
  const unit = levelUnit(form.values.target);
  const field = (key: keyof Values, label: string) => (
    <View style={styles.field}>
      <TextField label={label} value={form.values[key]} onChangeText={(t) => form.setFieldValue(key, t)} error={err(key)} autoCapitalize="none" autoCorrect={false} />
    </View>
  );

  return (
    <View style={styles.box} role="region" aria-label="Pulse train" testID="pulse-train">
      <Text variant="bodyStrong">Pulse train</Text>
      <LevelTargetFields
        target={form.values.target}
        vin={form.values.vin}
        vout={form.values.vout}
        deviceIds={deviceIds}
        railPlan={railPlan}
        errors={{ vin: err('vin'), vout: err('vout') }}
        onChange={(key, value) => form.setFieldValue(key, value)}
      />
      <View style={styles.row}>
        {field('onLevel', `On level (${unit})`)}
        {field('offLevel', `Off level (${unit})`)}
        {field('onS', 'On for (s)')}
        {field('offS', 'Off for (s)')}
        {field('count', 'Pulses')}
      </View>
      <Text variant="caption" tone="muted">
        Appended as one group: an on and an off segment, repeated.
      </Text>
      <View style={styles.actions}>
        <Button label="Append pulse train" onPress={() => form.handleSubmit()} />
        <Button label="Cancel" variant="secondary" onPress={onClose} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.accent, backgroundColor: color.accentSoft },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  field: { width: 140 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
