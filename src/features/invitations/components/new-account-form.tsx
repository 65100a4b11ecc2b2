import { useFormik } from 'formik';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, fieldErrors } from '@/api';
import { Button, InlineAlert, Text, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { signUpSchema } from '@/validation';

export type NewAccountFormProps = {
  email: string;
  teamName: string;
  /** Address of whoever is signed in in this browser, if anyone. */
  signedInAs?: string;
  onAccept: (input: { name: string; password: string }) => Promise<unknown>;
};

// The same rules as sign-up: the account is the same kind of account.
const schema = signUpSchema.pick(['name', 'password']);

/** An address without an account: name and password create it on acceptance. */
export function NewAccountForm({ email, teamName, signedInAs, onAccept }: NewAccountFormProps) {
  const [serverError, setServerError] = useState<string | null>(null);
  const form = useFormik({
    initialValues: { name: '', password: '' },
    validationSchema: schema,
    onSubmit: async (values, helpers) => {
      setServerError(null);
      try {
        await onAccept(schema.cast(values));
      } catch (error) {
        helpers.setErrors(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });
  const shownError = (field: 'name' | 'password') => (form.touched[field] ? form.errors[field] : undefined);

  return (
    <View style={styles.form}>
      <Text tone="muted">
        Create your account for <Text variant="bodyStrong">{email}</Text> to join {teamName}.
      </Text>
      {signedInAs ? (
        <InlineAlert
          tone="info"
          message={`You are signed in as ${signedInAs}. Joining signs this browser in as the new account instead.`}
        />
      ) : null}
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
        label="Password"
        value={form.values.password}
        onChangeText={form.handleChange('password')}
        onBlur={form.handleBlur('password')}
        error={shownError('password')}
        hint="At least 10 characters."
        secureTextEntry
        autoComplete="new-password"
        textContentType="newPassword"
        onSubmitEditing={() => form.handleSubmit()}
      />
      {serverError ? <InlineAlert message={serverError} /> : null}
      <Button label="Create account and join" onPress={() => form.handleSubmit()} busy={form.isSubmitting} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
});
