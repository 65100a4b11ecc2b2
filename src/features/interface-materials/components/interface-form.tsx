import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, fieldErrors } from '@/api';
import { Button, Chip, InlineAlert, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { schemaErrors } from '@/features/catalogues/form-values';
import { interfaceMaterialSchema } from '@/validation';

import { useSaveInterfaceMaterial } from '../api';
import { KIND_LABELS } from '../interface-format';
import { interfaceInput, type InterfaceFormValues } from '../interface-form-values';
import type { InterfaceMaterial } from '../types';

export type InterfaceFormProps = {
  initial: InterfaceFormValues;
  id?: number;
  teamId?: number;
  onSaved: (material: InterfaceMaterial) => void;
  onCancel: () => void;
};

type TextKey = Exclude<keyof InterfaceFormValues, 'kind'>;

/** Create or edit an interface material, checked with the schema the server uses. */
export function InterfaceForm({ initial, id, teamId, onSaved, onCancel }: InterfaceFormProps) {
  const save = useSaveInterfaceMaterial(id);
  const [serverError, setServerError] = useState<string | null>(null);
  const [serverFields, setServerFields] = useState<Record<string, string>>({});
  const form = useFormik<InterfaceFormValues>({
    initialValues: initial,
    validate: (values) => schemaErrors(interfaceMaterialSchema, interfaceInput(values)),
    onSubmit: async (values) => {
      setServerError(null);
      setServerFields({});
      try {
        onSaved(await save.mutateAsync({ ...interfaceInput(values), ...(id === undefined && teamId !== undefined ? { teamId } : {}) }));
      } catch (error) {
        setServerFields(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });
  const errors = form.errors as Record<string, string | undefined>;
  const field = (key: TextKey, label: string, opts: { unit?: string; hint?: string; multiline?: boolean; numeric?: boolean } = {}) => (
    <TextField
      label={opts.unit ? `${label} (${opts.unit})` : label}
      value={form.values[key]}
      onChangeText={form.handleChange(key)}
      onBlur={form.handleBlur(key)}
      error={(form.touched[key] || form.submitCount > 0 ? errors[key] : undefined) ?? serverFields[key]}
      hint={opts.hint}
      multiline={opts.multiline}
      inputMode={opts.numeric ? 'decimal' : undefined}
    />
  );
  const perPackage = form.values.kind === 'per_package';
  return (
    <View style={styles.form}>
      {field('name', 'Name')}
      <View style={styles.group}>
        <Text variant="label" tone="muted">
          Kind
        </Text>
        <View role="radiogroup" aria-label="Kind" style={styles.chips}>
          {(['per_package', 'per_area'] as const).map((kind) => (
            <Chip key={kind} label={KIND_LABELS[kind]} selected={form.values.kind === kind} onPress={() => form.setFieldValue('kind', kind)} />
          ))}
        </View>
        <Text variant="caption" tone="faint">
          {perPackage
            ? 'A typical Rθcs for one package, as a datasheet or mounting kit states it.'
            : 'Bulk conductivity and thickness; the resistance then scales with the contact area.'}
        </Text>
      </View>
      {perPackage ? (
        <>
          {field('packageName', 'Package', { hint: 'For example TO-220 or TO-247.' })}
          {field('rthKPerW', 'Rθcs', { unit: 'K/W', numeric: true })}
        </>
      ) : (
        <>
          {field('conductivityWPerMK', 'Conductivity', { unit: 'W/(m·K)', numeric: true })}
          {field('thicknessMm', 'Thickness', { unit: 'mm', numeric: true })}
          {field('contactKCm2PerW', 'Contact resistance', { unit: 'K·cm²/W', numeric: true, hint: 'Both faces together; leave empty if unknown.' })}
        </>
      )}
      {field('notes', 'Notes', { multiline: true })}
      {serverError ? <InlineAlert message={serverError} /> : null}
      <View style={styles.actions}>
        <Button label={id === undefined ? 'Add material' : 'Save changes'} onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
        <Button label="Cancel" variant="secondary" onPress={onCancel} disabled={form.isSubmitting} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  group: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
