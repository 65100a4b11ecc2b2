import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorCode, errorMessage, fieldErrors } from '@/api';
import { Button, Card, InlineAlert, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import type { Role } from '@/features/auth/types';
import { invitationSchema } from '@/validation';

import { useInvite } from '../api';
import { RoleSelect } from './role-select';

export type InviteFormProps = { teamId: number; teamName: string };

type Values = { email: string; role: Role };

const initialValues: Values = { email: '', role: 'designer' };

/** Owners invite by e-mail; the invitee gets a single-use link. */
export function InviteForm({ teamId, teamName }: InviteFormProps) {
  const invite = useInvite(teamId);
  const [serverError, setServerError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);

  const form = useFormik<Values>({
    initialValues,
    validationSchema: invitationSchema,
    onSubmit: async (values, helpers) => {
      setServerError(null);
      setSentTo(null);
      try {
        const invitation = await invite.mutateAsync(invitationSchema.cast(values));
        helpers.resetForm({ values: { ...initialValues, role: values.role } });
        setSentTo(invitation.email);
      } catch (error) {
        if (errorCode(error) === 'already_member') {
          helpers.setErrors({ email: errorMessage(error) });
          return;
        }
        helpers.setErrors(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });

  return (
    <Card style={styles.card}>
      <Text variant="heading">Invite someone</Text>
      <Text tone="muted">
        They get an e-mail with a link to join {teamName}. The link works once and expires.
      </Text>
      <TextField
        label="E-mail to invite"
        value={form.values.email}
        onChangeText={form.handleChange('email')}
        onBlur={form.handleBlur('email')}
        error={form.touched.email ? form.errors.email : undefined}
        autoCapitalize="none"
        autoComplete="off"
        inputMode="email"
        onSubmitEditing={() => form.handleSubmit()}
      />
      <View style={styles.field}>
        <Text variant="label" tone="muted">
          Role
        </Text>
        <RoleSelect label="Role of the invitee" value={form.values.role} onChange={(role) => form.setFieldValue('role', role)} />
      </View>
      {serverError ? <InlineAlert message={serverError} /> : null}
      {sentTo ? <InlineAlert tone="info" message={`Invitation sent to ${sentTo}.`} /> : null}
      <Button label="Send invitation" onPress={() => form.handleSubmit()} busy={form.isSubmitting} style={styles.submit} />
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  field: { gap: spacing.xs },
  submit: { alignSelf: 'flex-start' },
});
