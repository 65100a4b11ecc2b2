import { useFormik } from 'formik';
import { StyleSheet, View } from 'react-native';

import { Button, Chip, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { TOLERANCE_LIMITS, type ToleranceInput } from '@/validation/tolerance';

import { initialToleranceValues, readToleranceForm, type ToleranceFormValues } from '../tolerance-form-values';
import { DISTRIBUTION_TEXT } from '../tolerance-text';

export type ToleranceFormProps = {
  running: boolean;
  /** Field messages from the last run (the server's or the worker's), by field. */
  fieldErrors: Record<string, string>;
  onRun: (input: ToleranceInput) => void;
  onStop: () => void;
};

type TextKey = Exclude<keyof ToleranceFormValues, 'mode' | 'datasheet'>;

const FIELDS: { key: TextKey; label: string; unit: string; hint?: string }[] = [
  { key: 'rthJcPct', label: 'Rθjc spread', unit: '± %' },
  { key: 'rthSaPct', label: 'Rθsa spread', unit: '± %' },
  { key: 'interfacePct', label: 'Interface spread', unit: '± %' },
  { key: 'ambientLowK', label: 'Ambient low', unit: 'K', hint: 'Shift of the study’s ambient' },
  { key: 'ambientHighK', label: 'Ambient high', unit: 'K' },
  { key: 'linePct', label: 'Line voltage', unit: '± %', hint: 'Segment Vin and rail sources' },
  { key: 'loadPct', label: 'Load current', unit: '± %' },
  { key: 'sharePct', label: 'Share error', unit: '± %', hint: 'Current between parts in parallel' },
];

/** The spreads, the mode and, for Monte Carlo, the runs, seed and distribution; checked with the route's schema. */
export function ToleranceForm({ running, fieldErrors, onRun, onStop }: ToleranceFormProps) {
  const form = useFormik<ToleranceFormValues>({
    initialValues: initialToleranceValues(),
    validate: (values) => readToleranceForm(values).errors,
    onSubmit: (values) => {
      const { input } = readToleranceForm(values);
      if (input) onRun(input);
    },
  });
  const errors = form.errors as Record<string, string | undefined>;
  const field = (key: TextKey, label: string, unit: string, hint?: string) => (
    <View key={key} style={styles.field}>
      <TextField
        label={`${label} (${unit})`}
        value={form.values[key]}
        onChangeText={form.handleChange(key)}
        onBlur={form.handleBlur(key)}
        error={(form.touched[key] || form.submitCount > 0 ? errors[key] : undefined) ?? fieldErrors[key]}
        hint={hint}
        inputMode={key === 'runs' || key === 'seed' ? 'numeric' : 'decimal'}
        autoCapitalize="none"
        autoCorrect={false}
      />
    </View>
  );
  const monteCarlo = form.values.mode === 'monte-carlo';
  return (
    <View style={styles.form}>
      <View style={styles.group}>
        <Text variant="label" tone="muted">
          Mode
        </Text>
        <View role="radiogroup" aria-label="Mode" style={styles.chips}>
          <Chip label="Monte Carlo" selected={monteCarlo} onPress={() => form.setFieldValue('mode', 'monte-carlo')} />
          <Chip label="Corners" selected={!monteCarlo} onPress={() => form.setFieldValue('mode', 'corners')} />
        </View>
        <Text variant="caption" tone="faint">
          {monteCarlo ? 'Random draws of every spread, repeatable with the seed.' : 'Every combination of the extremes: 2^k runs for k spreads.'}
        </Text>
      </View>
      <View style={styles.fields}>{FIELDS.map((f) => field(f.key, f.label, f.unit, f.hint))}</View>
      {monteCarlo ? (
        <>
          <View style={styles.fields}>
            {field('runs', 'Runs', 'count', `At most ${TOLERANCE_LIMITS.maxRuns.toLocaleString('en')}`)}
            {field('seed', 'Seed', 'whole number')}
          </View>
          <View style={styles.group}>
            <Text variant="label" tone="muted">
              Datasheet spreads
            </Text>
            <View role="radiogroup" aria-label="Datasheet spreads" style={styles.chips}>
              <Chip label="Normal, ± as 3σ" selected={form.values.datasheet === 'normal'} onPress={() => form.setFieldValue('datasheet', 'normal')} />
              <Chip label="Uniform" selected={form.values.datasheet === 'uniform'} onPress={() => form.setFieldValue('datasheet', 'uniform')} />
            </View>
            <Text variant="caption" tone="faint">
              {DISTRIBUTION_TEXT}
            </Text>
          </View>
        </>
      ) : null}
      <View style={styles.actions}>
        <Button label={running ? 'Running…' : 'Run sweep'} onPress={() => form.handleSubmit()} busy={running} disabled={running} />
        {running ? <Button label="Stop" variant="secondary" onPress={onStop} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  group: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  field: { flexGrow: 1, flexBasis: 150, maxWidth: 240 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
