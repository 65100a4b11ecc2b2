import { Link } from 'expo-router';
import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorCode, errorMessage, fieldErrors } from '@/api';
import { Button, InlineAlert, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { signUpSchema, type SignUpInput } from '@/validation';

import { useSignUp } from './api';
import { AuthFrame } from './components/auth-frame';

const EMAIL_TAKEN = 'An account with this e-mail already exists. Sign in instead.';

const initialValues: SignUpInput = { name: '', email: '', password: '', teamName: '' };

export function SignUpScreen() {
  const signUp = useSignUp();
  const [serverError, setServerError] = useState<string | null>(null);

  const form = useFormik({
    initialValues,
    validationSchema: signUpSchema,
    onSubmit: async (values, helpers) => {
      setServerError(null);
      try {
        await signUp.mutateAsync(signUpSchema.cast(values));
      } catch (error) {
        if (errorCode(error) === 'email_taken') {
          helpers.setErrors({ email: EMAIL_TAKEN });
          setServerError(null);
          return;
        }
        helpers.setErrors(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });

  const shownError = (field: keyof SignUpInput) => (form.touched[field] ? form.errors[field] : undefined);

  return (
    <AuthFrame title="Create an account">
      <Text tone="muted">You start a new team and become its owner.</Text>
      <View style={styles.fields}>
        <TextField
          label="Your name"
          value={form.values.name}
          onChangeText={form.handleChange('name')}
          onBlur={form.handleBlur('name')}
          error={shownError('name')}
          autoComplete="name"
          textContentType="name"
        />
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
          hint="At least 10 characters."
          secureTextEntry
          autoComplete="new-password"
          textContentType="newPassword"
        />
        <TextField
          label="Team name"
          value={form.values.teamName}
          onChangeText={form.handleChange('teamName')}
          onBlur={form.handleBlur('teamName')}
          error={shownError('teamName')}
          onSubmitEditing={() => form.handleSubmit()}
        />
      </View>
      {serverError ? <InlineAlert message={serverError} /> : null}
      <Button label="Create account" onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
      <View style={styles.switch}>
        <Text tone="muted">Already have an account?</Text>
        <Link href="/sign-in" style={styles.link}>
          <Text tone="accent" variant="bodyStrong">
            Sign in
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
