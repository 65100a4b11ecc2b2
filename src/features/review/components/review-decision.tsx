import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ValidationError } from 'yup';

import { errorMessage } from '@/api';
import { Button, InlineAlert, TextField } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { reviewSchema } from '@/validation';

import { useReviewStudy } from '../api';
import type { ReviewDecision as Decision } from '../types';

export type ReviewDecisionProps = { studyId: number; revision: number };

/** Approve, or ask for changes with a comment, on the revision in review. */
export function ReviewDecision({ studyId, revision }: ReviewDecisionProps) {
  const review = useReviewStudy(studyId);
  const [comment, setComment] = useState('');
  const [commentError, setCommentError] = useState<string | undefined>();
  const [pending, setPending] = useState<Decision | null>(null);

  const decide = (decision: Decision) => {
    setCommentError(undefined);
    let input;
    try {
      // The shared schema: a request for changes must say what should change.
      input = reviewSchema.validateSync({ decision, comment, revision });
    } catch (error) {
      if (error instanceof ValidationError) setCommentError(error.message);
      return;
    }
    setPending(decision);
    review.mutate(input, { onSettled: () => setPending(null) });
  };

  return (
    <View style={styles.box}>
      <TextField
        label="Review comment"
        hint="Required when asking for changes; optional with an approval."
        value={comment}
        onChangeText={setComment}
        error={commentError}
        multiline
      />
      {review.isError ? <InlineAlert message={errorMessage(review.error)} /> : null}
      <View style={styles.actions}>
        <Button
          label="Approve"
          onPress={() => decide('approved')}
          busy={pending === 'approved'}
          disabled={pending !== null}
        />
        <Button
          label="Request changes"
          variant="secondary"
          onPress={() => decide('changes_requested')}
          busy={pending === 'changes_requested'}
          disabled={pending !== null}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
