import { useFormik } from 'formik';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, Icon, InlineAlert, Text, TextField } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { anchorLabel } from '../anchor-label';
import { useAddComment } from '../api';
import { commentErrors, commentPayload, type CommentFormValues } from '../comment-payload';
import type { CommentAnchor } from '../types';

export type CommentFormProps = {
  studyId: number;
  chartAnchor: CommentAnchor | null;
  onClearChartAnchor: () => void;
};

const initialValues: CommentFormValues = { body: '', timeS: '' };

export function CommentForm({ studyId, chartAnchor, onClearChartAnchor }: CommentFormProps) {
  const add = useAddComment(studyId);
  const [serverError, setServerError] = useState<string | null>(null);
  const form = useFormik<CommentFormValues>({
    initialValues,
    validate: (values) => commentErrors(values, chartAnchor),
    onSubmit: async (values, helpers) => {
      setServerError(null);
      try {
        const payload = commentPayload(values, chartAnchor);
        await add.mutateAsync({ ...payload, body: payload.body.trim() });
        helpers.resetForm();
        if (chartAnchor) onClearChartAnchor();
      } catch (error) {
        setServerError(errorMessage(error));
      }
    },
  });

  return (
    <View style={styles.form}>
      <TextField
        label="Add a comment"
        value={form.values.body}
        onChangeText={form.handleChange('body')}
        onBlur={form.handleBlur('body')}
        error={form.touched.body ? form.errors.body : undefined}
        multiline
      />
      {chartAnchor ? (
        <View style={styles.pinned}>
          <Icon name="pin" size={14} color={color.accent} />
          <Text variant="label" tone="accent">
            Pinned {anchorLabel(chartAnchor)}
          </Text>
          <Pressable role="button" accessibilityLabel="Remove the pin" onPress={onClearChartAnchor} style={styles.unpin}>
            <Text variant="label" tone="muted">
              Remove
            </Text>
          </Pressable>
        </View>
      ) : (
        <View style={styles.time}>
          <TextField
            label="Pin to a time (s), optional"
            hint="A moment on the heat curves, in seconds from the start."
            value={form.values.timeS}
            onChangeText={form.handleChange('timeS')}
            onBlur={form.handleBlur('timeS')}
            error={form.touched.timeS ? form.errors.timeS : undefined}
            inputMode="decimal"
          />
        </View>
      )}
      {serverError ? <InlineAlert message={serverError} /> : null}
      <Button label="Post comment" onPress={() => form.handleSubmit()} busy={form.isSubmitting} style={styles.submit} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md, paddingTop: spacing.md },
  time: { maxWidth: 280 },
  pinned: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.xs,
    paddingLeft: spacing.sm,
    borderRadius: radius.pill,
    backgroundColor: color.accentSoft,
  },
  unpin: { paddingHorizontal: spacing.sm, paddingVertical: spacing.xs },
  submit: { alignSelf: 'flex-start' },
});
