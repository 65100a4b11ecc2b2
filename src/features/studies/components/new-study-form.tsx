import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, fieldErrors } from '@/api';
import { Button, InlineAlert, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import type { Membership } from '@/features/auth/types';
import { studyCreateSchema } from '@/validation';

import { useCreateStudy } from '../api';
import type { Study } from '../types';
import { NewStudyDefaults } from './new-study-defaults';
import { TeamPicker } from './team-picker';

export type NewStudyFormProps = {
  teams: readonly Membership[];
  /** Preselected team (the current one), when it is among `teams`. */
  initialTeamId?: number;
  onCreated: (study: Study) => void;
  onCancel: () => void;
};

type Values = { title: string; description: string; teamId: number };

export function NewStudyForm({ teams, initialTeamId, onCreated, onCancel }: NewStudyFormProps) {
  const create = useCreateStudy();
  const [serverError, setServerError] = useState<string | null>(null);

  const form = useFormik<Values>({
    initialValues: {
      title: '',
      description: '',
      teamId: teams.find((team) => team.teamId === initialTeamId)?.teamId ?? teams[0].teamId,
    },
    validationSchema: studyCreateSchema,
    onSubmit: async (values, helpers) => {
      setServerError(null);
      try {
        onCreated(await create.mutateAsync(studyCreateSchema.cast(values)));
      } catch (error) {
        helpers.setErrors(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });

  const shownError = (field: 'title' | 'description') => (form.touched[field] ? form.errors[field] : undefined);

  return (
    <View style={styles.form}>
      {teams.length > 1 ? (
        <TeamPicker teams={teams} value={form.values.teamId} onChange={(id) => form.setFieldValue('teamId', id)} />
      ) : null}
      <TextField
        label="Title"
        placeholder="e.g. 12 V rail, LDO on 2-layer board"
        value={form.values.title}
        onChangeText={form.handleChange('title')}
        onBlur={form.handleBlur('title')}
        error={shownError('title')}
        onSubmitEditing={() => form.handleSubmit()}
      />
      <TextField
        label="Description"
        hint="Optional: the design question this study answers."
        value={form.values.description}
        onChangeText={form.handleChange('description')}
        onBlur={form.handleBlur('description')}
        error={shownError('description')}
        multiline
      />
      <NewStudyDefaults teamId={form.values.teamId} />
      {serverError ? <InlineAlert message={serverError} /> : null}
      <View style={styles.actions}>
        <Button label="Create study" onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
        <Button label="Cancel" variant="secondary" onPress={onCancel} disabled={form.isSubmitting} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
