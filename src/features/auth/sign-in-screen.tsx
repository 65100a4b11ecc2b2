import { Link } from 'expo-router';
import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, fieldErrors } from '@/api';
import { Button, InlineAlert, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { signInSchema, type SignInInput } from '@/validation';

import { useSignIn } from './api';
import { AuthFrame } from './components/auth-frame';
import { DemoAccountsHint } from './components/demo-accounts-hint';

const initialValues: SignInInput = { email: '', password: '' };

export function SignInScreen() {
  const signIn = useSignIn();
  const [serverError, setServerError] = useState<string | null>(null);

  const form = useFormik({
    initialValues,
    validationSchema: signInSchema,
    onSubmit: async (values, helpers) => {
      setServerError(null);
      try {
        await signIn.mutateAsync(signInSchema.cast(values));
      } catch (error) {
        helpers.setErrors(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });

  const shownError = (field: keyof SignInInput) => (form.touched[field] ? form.errors[field] : undefined);

  return (
    <AuthFrame
      title="Sign in"
      footer={<DemoAccountsHint onPick={(email) => form.setFieldValue('email', email)} />}
    >
      <View style={styles.fields}>
        <TextField
          label="E-mail"
          value={form.values.email}
          onChangeText={form.handleChange('email')}
          onBlur={form.handleBlur('email')}
          error={shownError('email')}
          autoCapitalize="none"
          autoComplete="email"
          inputMode="email"
          textContentType="emailAddress"
        />
        <TextField
          label="Password"
          value={form.values.password}
          onChangeText={form.handleChange('password')}
          onBlur={form.handleBlur('password')}
          error={shownError('password')}
          secureTextEntry
          autoComplete="current-password"
          textContentType="password"
          onSubmitEditing={() => form.handleSubmit()}
        />
      </View>
      {serverError ? <InlineAlert message={serverError} /> : null}
      <Button label="Sign in" onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
      <Link href="/forgot-password" style={styles.link}>
        <Text tone="accent" variant="label">
          Forgot password?
        </Text>
      </Link>
      <View style={styles.switch}>
        <Text tone="muted">New to Junctura?</Text>
        <Link href="/sign-up" style={styles.link}>
          <Text tone="accent" variant="bodyStrong">
            Create an account
          </Text>
        </Link>
      </View>
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.md },
  switch: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs, alignItems: 'center' },
  link: { paddingVertical: spacing.xs },
});
