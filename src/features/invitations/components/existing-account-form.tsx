import { Link } from 'expo-router';
import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import * as yup from 'yup';

import { errorMessage } from '@/api';
import { Button, InlineAlert, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import type { Session } from '@/features/auth/types';
import { signInSchema } from '@/validation';

export type ExistingAccountFormProps = {
  email: string;
  teamName: string;
  session: Session | null;
  onAccept: (input: { password?: string }) => Promise<unknown>;
};

const passwordSchema = yup.object({ password: signInSchema.fields.password });

/**
 * An address that has an account: signed in as it, one press joins; otherwise its password
 * proves it (and signs this browser in as that account).
 */
export function ExistingAccountForm({ email, teamName, session, onAccept }: ExistingAccountFormProps) {
  const [serverError, setServerError] = useState<string | null>(null);
  const signedInAsInvitee = session?.user.email === email;
  const form = useFormik({
    initialValues: { password: '' },
    validationSchema: signedInAsInvitee ? undefined : passwordSchema,
    onSubmit: async (values, helpers) => {
      setServerError(null);
      try {
        await onAccept(signedInAsInvitee ? {} : { password: values.password });
      } catch (error) {
        if (signedInAsInvitee) setServerError(errorMessage(error));
        else helpers.setErrors({ password: errorMessage(error) });
      }
    },
  });

  if (signedInAsInvitee) {
    return (
      <View style={styles.form}>
        <Text>
          You are signed in as <Text variant="bodyStrong">{email}</Text>.
        </Text>
        {serverError ? <InlineAlert message={serverError} /> : null}
        <Button label={`Join ${teamName}`} onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
      </View>
    );
  }
  return (
    <View style={styles.form}>
      <Text>
        <Text variant="bodyStrong">{email}</Text> already has an account. Enter its password to join {teamName}.
      </Text>
      {session ? (
        <InlineAlert
          tone="info"
          message={`You are signed in as ${session.user.email}. Joining signs this browser in as ${email} instead.`}
        />
      ) : null}
      <TextField
        label="Password"
        value={form.values.password}
        onChangeText={form.handleChange('password')}
        onBlur={form.handleBlur('password')}
        error={form.touched.password ? form.errors.password : undefined}
        secureTextEntry
        autoComplete="current-password"
        textContentType="password"
        onSubmitEditing={() => form.handleSubmit()}
      />
      <Button label="Sign in and join" onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
      {session ? null : (
        <Link href="/forgot-password" style={styles.link}>
          <Text variant="label" tone="accent">
            Forgot password?
          </Text>
        </Link>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  link: { alignSelf: 'flex-start', paddingVertical: spacing.xs },
});
