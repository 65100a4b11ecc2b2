import { Link } from 'expo-router';
import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, errorStatus } from '@/api';
import { Button, InlineAlert, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { AuthFrame } from '@/features/auth/components/auth-frame';
import { passwordResetRequestSchema } from '@/validation';

import { useRequestPasswordReset } from './api';

/** Asks for a reset link. The answer never tells whether the address has an account. */
export function ForgotPasswordScreen() {
  const request = useRequestPasswordReset();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [serverError, setServerError] = useState<string | null>(null);

  const form = useFormik({
    initialValues: { email: '' },
    validationSchema: passwordResetRequestSchema,
    onSubmit: async (values) => {
      setServerError(null);
      const input = passwordResetRequestSchema.cast(values);
      try {
        await request.mutateAsync(input);
        setSentTo(input.email);
      } catch (error) {
        // Only "try later" and "no connection" are worth saying; the answer is otherwise the same.
        const status = errorStatus(error);
        if (status === 429 || status === undefined || status >= 500) setServerError(errorMessage(error));
        else setSentTo(input.email);
      }
    },
  });

  return (
    <AuthFrame title="Reset your password">
      {sentTo ? (
        <View role="status" style={styles.fields}>
          <Text>
            If an account uses <Text variant="bodyStrong">{sentTo}</Text>, a link to choose a new password is on its
            way. The link works once and expires after a short time.
          </Text>
          <Text tone="muted">Nothing arrived? Check the address and ask again.</Text>
        </View>
      ) : (
        <>
          <Text tone="muted">Give the e-mail of your account; we send a link to choose a new password.</Text>
          <TextField
            label="E-mail"
            value={form.values.email}
            onChangeText={form.handleChange('email')}
            onBlur={form.handleBlur('email')}
            error={form.touched.email ? form.errors.email : undefined}
            autoCapitalize="none"
            autoComplete="email"
            inputMode="email"
            textContentType="emailAddress"
            onSubmitEditing={() => form.handleSubmit()}
          />
          {serverError ? <InlineAlert message={serverError} /> : null}
          <Button label="Send reset link" onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
        </>
      )}
      <Link href="/sign-in" style={styles.link}>
        <Text tone="accent" variant="bodyStrong">
          Back to sign-in
        </Text>
      </Link>
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.md },
  link: { paddingVertical: spacing.xs },
});
