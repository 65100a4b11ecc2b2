import { useFormik } from 'formik';
import { StyleSheet, View } from 'react-native';
import * as yup from 'yup';

import { Button, Text, TextField } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { quantityText, schemaErrors, targetSchema, valueOf } from '../helper-schemas';
import { ramp } from '../profile-helpers';
import type { RawSegment } from '../types';
import { levelKind, levelTarget, levelUnit, LevelTargetFields } from './level-target';

type Values = { target: string; vin: string; vout: string; start: string; end: string; durationS: string; steps: string };

const MAX_STEPS = 1000;

const schema = (railPlan: boolean, target: string) =>
  yup.object({
    ...targetSchema(railPlan),
    start: quantityText(levelKind(target), { min: 0 }),
    end: quantityText(levelKind(target), { min: 0 }),
    durationS: quantityText('time', { above: 0 }),
    steps: quantityText('integer', { min: 1, max: MAX_STEPS }),
  });

export type RampFormProps = { deviceIds: string[]; railPlan: boolean; held: { vin: string; vout: string }; onAppend: (segments: RawSegment[]) => void; onClose: () => void };

/** A start and end level over a time, in equal steps: appended as that many segments. */
export function RampForm({ deviceIds, railPlan, held, onAppend, onClose }: RampFormProps) {
  const form = useFormik<Values>({
    initialValues: { target: 'current', vin: held.vin, vout: held.vout, start: '', end: '', durationS: '', steps: '10' },
    validate: (values) => schemaErrors(schema(railPlan, values.target), values),
    onSubmit: (values) => {
      const kind = levelKind(values.target);
      onAppend(
        ramp(levelTarget(values, railPlan), {
          startLevel: valueOf(values.start, kind),
          endLevel: valueOf(values.end, kind),
          durationS: valueOf(values.durationS, 'time'),
          steps: valueOf(values.steps, 'integer'),
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
    <View style={styles.box} role="region" aria-label="Ramp" testID="ramp">
      <Text variant="bodyStrong">Ramp</Text>
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
        {field('start', `From (${unit})`)}
        {field('end', `To (${unit})`)}
        {field('durationS', 'Over (s)')}
        {field('steps', 'Steps')}
      </View>
      <Text variant="caption" tone="muted">
        Each step holds the ramp’s mean over its share of the time, as the solver does for ambient ramps: 0 → 8 A in 4 steps gives 1, 3, 5 and 7 A.
      </Text>
      <View style={styles.actions}>
        <Button label="Append ramp" onPress={() => form.handleSubmit()} />
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
