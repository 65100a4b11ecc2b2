import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, fieldErrors } from '@/api';
import { Button, Chip, InlineAlert, Text, TextField, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { schemaErrors } from '@/features/catalogues/form-values';
import { heatsinkSchema } from '@/validation';

import { useSaveHeatsink } from '../api';
import { heatsinkInput, type HeatsinkFormValues } from '../heatsink-form-values';
import type { Heatsink } from '../types';
import { ExponentFit } from './exponent-fit';
import { ForcedAirPoints } from './forced-air-points';

export type HeatsinkFormProps = {
  initial: HeatsinkFormValues;
  /** Editing an existing heatsink; without it a new one is created in teamId. */
  id?: number;
  teamId?: number;
  onSaved: (heatsink: Heatsink) => void;
  onCancel: () => void;
};

type TextKey = Exclude<keyof HeatsinkFormValues, 'forcedAir' | 'material'>;

/** Form field → schema path its message comes under. */
const PATH: Partial<Record<TextKey, string>> = { massG: 'massKg' };

const MATERIALS = [
  { value: '', label: 'Not given' },
  { value: 'aluminium', label: 'Aluminium' },
  { value: 'copper', label: 'Copper' },
] as const;

/** Create or edit a heatsink, checked with the same schema the server uses. */
export function HeatsinkForm({ initial, id, teamId, onSaved, onCancel }: HeatsinkFormProps) {
  const wide = useIsWide();
  const save = useSaveHeatsink(id);
  const [serverError, setServerError] = useState<string | null>(null);
  const [serverFields, setServerFields] = useState<Record<string, string>>({});

  const form = useFormik<HeatsinkFormValues>({
    initialValues: initial,
    validate: (values) => schemaErrors(heatsinkSchema, heatsinkInput(values)),
    onSubmit: async (values) => {
      setServerError(null);
      setServerFields({});
      try {
        onSaved(await save.mutateAsync({ ...heatsinkInput(values), ...(id === undefined && teamId !== undefined ? { teamId } : {}) }));
      } catch (error) {
        setServerFields(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });

  const errors = form.errors as Record<string, string | undefined>;
  const shown = (path: string, touched: boolean) => (touched || form.submitCount > 0 ? errors[path] : undefined) ?? serverFields[path];

  const field = (key: TextKey, label: string, opts: { unit?: string; hint?: string; placeholder?: string; multiline?: boolean; numeric?: boolean } = {}) => (
    <View style={[styles.field, wide && !opts.multiline && key !== 'name' && styles.half]}>
      <TextField
        label={opts.unit ? `${label} (${opts.unit})` : label}
        value={form.values[key]}
        onChangeText={form.handleChange(key)}
        onBlur={form.handleBlur(key)}
        error={shown(PATH[key] ?? key, Boolean(form.touched[key]))}
        hint={opts.hint}
        placeholder={opts.placeholder}
        multiline={opts.multiline}
        inputMode={opts.numeric === false || opts.multiline ? undefined : 'decimal'}
      />
    </View>
  );

  return (
    <View style={styles.form}>
      <Text variant="heading">General</Text>
      {field('name', 'Name', { numeric: false })}
      {field('description', 'Description', { multiline: true })}

      <Text variant="heading">Thermal</Text>
      <View style={styles.grid}>
        {field('rthKPerW', 'Rθsa in still air', { unit: 'K/W' })}
        {field('referenceRiseK', 'Reference rise', { unit: 'K', hint: 'The sink rise above ambient the still-air Rθsa is rated at.' })}
        {field('convectionExponent', 'Convection exponent n', {
          placeholder: '1/4 (default)',
          hint: 'How still-air Rθsa falls as the sink runs hotter: Rθsa × (reference rise / rise)^n, n from 0 to 1. Empty for 1/4, laminar natural convection; about 1/3 for turbulent flow. Radiation or a maker’s curve may call for another n: fit it from two ratings.',
        })}
      </View>
      <ExponentFit rthKPerW={form.values.rthKPerW} referenceRiseK={form.values.referenceRiseK} onUse={(text) => form.setFieldValue('convectionExponent', text)} />
      <ForcedAirPoints
        points={form.values.forcedAir}
        onChange={(points) => form.setFieldValue('forcedAir', points)}
        errorAt={(path) => (form.submitCount > 0 ? errors[path] : undefined) ?? serverFields[path]}
        listError={form.submitCount > 0 ? errors.forcedAir : undefined}
      />

      <Text variant="heading">Build</Text>
      <View style={styles.grid}>
        {field('massG', 'Mass', { unit: 'g' })}
        {field('capacityJPerK', 'Heat capacity', { unit: 'J/K', hint: 'Leave empty to derive it from mass and material.' })}
        {field('widthMm', 'Width', { unit: 'mm' })}
        {field('lengthMm', 'Length', { unit: 'mm' })}
        {field('heightMm', 'Height', { unit: 'mm' })}
        {field('devicesPerSink', 'Devices per sink', { hint: 'Whole number of packages it takes.' })}
      </View>
      <View style={styles.field}>
        <Text variant="label" tone="muted">
          Material
        </Text>
        <View role="radiogroup" aria-label="Material" style={styles.chips}>
          {MATERIALS.map((m) => (
            <Chip key={m.value} label={m.label} selected={form.values.material === m.value} onPress={() => form.setFieldValue('material', m.value)} />
          ))}
        </View>
      </View>

      <Text variant="heading">Other</Text>
      <View style={styles.grid}>{field('price', 'Price', { hint: 'In your team’s currency.' })}</View>
      {field('notes', 'Notes', { multiline: true })}

      {serverError ? <InlineAlert message={serverError} /> : null}
      {form.submitCount > 0 && Object.keys(form.errors).length > 0 ? (
        <InlineAlert message="Some values need attention: see the messages under the fields." />
      ) : null}
      <View style={styles.actions}>
        <Button label={id === undefined ? 'Add heatsink' : 'Save changes'} onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
        <Button label="Cancel" variant="secondary" onPress={onCancel} disabled={form.isSubmitting} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.md },
  field: { width: '100%' },
  half: { width: '48%' },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
