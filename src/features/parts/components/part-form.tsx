import { useFormik } from 'formik';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, fieldErrors } from '@/api';
import { SoaCsvPanel } from '@/components/soa-csv-panel';
import { Button, Card, InlineAlert, Text, TextField, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { schemaErrors } from '@/features/catalogues/form-values';
import { partSchema } from '@/validation';

import { useSavePart } from '../api';
import { KIND_LABEL } from '../part-format';
import { curveRows, emptyElectrical, emptySoa, type PartFormValues } from '../part-form-values';
import { partInput } from '../part-input';
import { messageAt, pathLabel } from '../part-paths';
import { fieldText, readField } from '../quantity-text';
import type { Part, PartKind, SoaCurveJson, ZthFitResponse } from '../types';
import { ChoiceChips } from './choice-chips';
import { ElectricalEditor } from './electrical-editor';
import { PartFormProvider } from './form-context';
import { NumberField } from './number-field';
import { SoaEditor } from './soa-editor';
import { ThermalEditor } from './thermal-editor';

export type PartFormProps = {
  initial: PartFormValues;
  /** Editing an existing part; without it a new one is created in teamId. */
  id?: number;
  teamId?: number;
  onSaved: (part: Part) => void;
  onCancel: () => void;
};

const KINDS = (['regulator', 'bipolar', 'darlington', 'mosfet'] as const).map((k) => ({ value: k, label: KIND_LABEL[k] }));

/** Every problem of the values: text that does not read as a number, then the shared part schema (the server's own checks). */
function validateValues(values: PartFormValues): Record<string, string> {
  const { input, problems } = partInput(values);
  return { ...schemaErrors(partSchema, input), ...problems };
}

/** Create or edit a part, checked with the same schema and model parsers the server uses. */
export function PartForm({ initial, id, teamId, onSaved, onCancel }: PartFormProps) {
  const wide = useIsWide();
  const save = useSavePart(id);
  const [touched, setTouched] = useState<ReadonlySet<string>>(new Set());
  const [serverError, setServerError] = useState<string | null>(null);
  const [serverFields, setServerFields] = useState<Record<string, string>>({});

  const form = useFormik<PartFormValues>({
    initialValues: initial,
    validate: validateValues,
    onSubmit: async (values) => {
      setServerError(null);
      setServerFields({});
      try {
        onSaved(await save.mutateAsync({ ...partInput(values).input, ...(id === undefined && teamId !== undefined ? { teamId } : {}) }));
      } catch (error) {
        setServerFields(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });
  const v = form.values;
  const errors = form.errors as Record<string, string>;
  const submitted = form.submitCount > 0;

  const context = useMemo(
    () => ({
      errorAt: (path: string) => ((submitted || touched.has(path) ? messageAt(errors, path) : undefined) ?? messageAt(serverFields, path)),
      touch: (path: string) => setTouched((t) => (t.has(path) ? t : new Set(t).add(path))),
    }),
    [errors, serverFields, submitted, touched],
  );
  const set = <K extends keyof PartFormValues>(key: K, value: PartFormValues[K]) => form.setFieldValue(key, value);

  const takeFit = (fit: ZthFitResponse) => {
    void form.setValues({
      ...v,
      thermal: { ...v.thermal, kind: 'foster', terms: fit.fit.terms.map((t) => ({ rKPerW: fieldText(t.rKPerW, 'number'), tauS: fieldText(t.tauS, 'time') })) },
      zthPoints: fit.points,
      zthFit: fit.fit,
    });
  };
  const takeCurves = (curves: SoaCurveJson[]) => set('soa', { ...(v.soa ?? emptySoa('points', v.tjMaxC)), kind: 'points', curves: curveRows(curves) });
  const transistor = v.kind === 'regulator' ? null : v.kind;
  const tj = readField(v.tjMaxC, 'temperature');
  const partTjMax = tj.ok ? tj.value : null;
  const problems = Object.entries({ ...errors, ...serverFields });

  const text = (key: 'name' | 'packageName' | 'description' | 'notes', label: string, opts: { multiline?: boolean; half?: boolean } = {}) => (
    <View style={[styles.field, wide && opts.half && styles.half]}>
      <TextField
        label={label}
        value={v[key]}
        onChangeText={form.handleChange(key)}
        onBlur={() => context.touch(key)}
        error={context.errorAt(key)}
        multiline={opts.multiline}
      />
    </View>
  );

  return (
    <PartFormProvider value={context}>
      <View style={styles.form}>
        <Card>
          <Text variant="heading">General</Text>
          {text('name', 'Name')}
          <ChoiceChips<PartKind> label="Kind" value={v.kind} options={KINDS} onChange={(kind) => set('kind', kind)} />
          <View style={styles.grid}>
            {text('packageName', 'Package', { half: true })}
            <View style={[styles.field, wide && styles.half]}>
              <NumberField label="Tj,max" unit="°C" path="tjMaxC" value={v.tjMaxC} size="full" onChange={(t) => set('tjMaxC', t)} />
            </View>
          </View>
          {text('description', 'Description', { multiline: true })}
        </Card>

        <Card>
          <Text variant="heading">Thermal model, junction to case</Text>
          <ThermalEditor
            value={v.thermal}
            zthPoints={v.zthPoints}
            onChange={(thermal) => void form.setValues({ ...v, thermal, zthFit: null })}
            onUseFit={takeFit}
            onRemovePoints={() => void form.setValues({ ...v, zthPoints: null, zthFit: null })}
          />
        </Card>

        <Card>
          <Text variant="heading">Electrical model</Text>
          {v.electrical ? (
            <ElectricalEditor value={v.electrical} onChange={(e) => set('electrical', e)} onRemove={() => set('electrical', null)} />
          ) : (
            <>
              <Text tone="muted">None: in a study the part has no quiescent current, dropout or current limit.</Text>
              <Button label="Add an electrical model" variant="secondary" style={styles.start} onPress={() => set('electrical', initial.electrical ?? emptyElectrical())} />
            </>
          )}
        </Card>

        <Card>
          <Text variant="heading">Safe operating area</Text>
          {transistor === null ? (
            <Text tone="muted">
              An integrated regulator protects itself with its current limit and shutdown: it has no SOA model.
              {v.soa ? ' The SOA values entered for another kind are not saved.' : ''}
            </Text>
          ) : v.soa ? (
            <SoaEditor values={v} value={v.soa} transistor={transistor} onChange={(soa) => set('soa', soa)} onRemove={() => set('soa', null)} />
          ) : (
            <>
              <Text tone="muted">No SOA model: a study cannot check this part’s operating points.</Text>
              <View style={styles.actions}>
                <Button label="Add SOA parameters" variant="secondary" onPress={() => set('soa', emptySoa('parameters', v.tjMaxC))} />
                <Button label="Add datasheet SOA curves" variant="secondary" onPress={() => set('soa', emptySoa('points', v.tjMaxC))} />
              </View>
              <SoaCsvPanel transistor={transistor} tjMaxC={partTjMax} onUse={takeCurves} />
            </>
          )}
        </Card>

        <Card>
          <Text variant="heading">Notes</Text>
          {text('notes', 'Notes', { multiline: true })}
        </Card>

        {serverError ? <InlineAlert message={serverError} /> : null}
        {submitted && problems.length > 0 ? (
          <View role="alert" style={styles.problems} testID="part-form-problems">
            <InlineAlert message="Some values need attention: see the messages under the fields." />
            {problems.map(([path, message]) => (
              <Text key={path} variant="caption" tone="danger">
                {pathLabel(path)}: {message}
              </Text>
            ))}
          </View>
        ) : null}
        <View style={styles.actions}>
          <Button label={id === undefined ? 'Add part' : 'Save changes'} onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
          <Button label="Cancel" variant="secondary" onPress={onCancel} disabled={form.isSubmitting} />
        </View>
      </View>
    </PartFormProvider>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.md },
  field: { width: '100%' },
  half: { width: '48%' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  start: { alignSelf: 'flex-start' },
  problems: { gap: spacing.xxs },
});
