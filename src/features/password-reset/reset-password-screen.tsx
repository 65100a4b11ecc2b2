import { Link } from 'expo-router';
import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, errorStatus, fieldErrors } from '@/api';
import { Button, InlineAlert, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { AuthFrame } from '@/features/auth/components/auth-frame';
import { passwordResetSchema } from '@/validation';

import { useResetPassword } from './api';

export type ResetPasswordScreenProps = { token: string };

type Outcome = 'form' | 'done' | 'gone';

/** Sets a new password from a single-use link. */
export function ResetPasswordScreen({ token }: ResetPasswordScreenProps) {
  const reset = useResetPassword(token);
  const [outcome, setOutcome] = useState<Outcome>('form');
  const [serverError, setServerError] = useState<string | null>(null);

  const form = useFormik({
    initialValues: { password: '' },
    validationSchema: passwordResetSchema,
    onSubmit: async (values, helpers) => {
      setServerError(null);
      try {
        await reset.mutateAsync(passwordResetSchema.cast(values));
        setOutcome('done');
      } catch (error) {
        if (errorStatus(error) === 410) {
          setOutcome('gone');
          return;
        }
        helpers.setErrors(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });

  if (outcome === 'gone') {
    return (
      <AuthFrame title="Link used or expired">
        <Text>This reset link has been used already or has expired. Each link works once, for a short time.</Text>
        <Link href="/forgot-password" style={styles.link}>
          <Text tone="accent" variant="bodyStrong">
            Ask for a new link
          </Text>
        </Link>
      </AuthFrame>
    );
  }
  if (outcome === 'done') {
    return (
      <AuthFrame title="Password changed">
        <Text>Your new password is set. Every earlier sign-in of this account has ended.</Text>
        <Link href="/sign-in" style={styles.link}>
          <Text tone="accent" variant="bodyStrong">
            Sign in
          </Text>
        </Link>
      </AuthFrame>
    );
  }
  return (
    <AuthFrame title="Choose a new password">
      <View style={styles.fields}>
        <TextField
          label="New password"
          value={form.values.password}
          onChangeText={form.handleChange('password')}
          onBlur={form.handleBlur('password')}
          error={form.touched.password ? form.errors.password : undefined}
          hint="At least 10 characters."
          secureTextEntry
          autoComplete="new-password"
          textContentType="newPassword"
          onSubmitEditing={() => form.handleSubmit()}
        />
      </View>
      {serverError ? <InlineAlert message={serverError} /> : null}
      <Button label="Set new password" onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.md },
  link: { paddingVertical: spacing.xs },
});
