import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, InlineAlert, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { useSignedInSession } from '@/features/auth/api';
import { useRevisions } from '@/features/revisions/api';
import { STATUS_COLORS } from '@/features/studies/status';
import { canEditStudy, canReviewInTeam } from '@/features/studies/study-permissions';
import type { Study } from '@/features/studies/types';

import { useReviews, useSubmitForReview } from './api';
import { ReviewDecision } from './components/review-decision';
import { ReviewHistory } from './components/review-history';
import { latestReviewOn, reviewCopy } from './review-copy';

export type ReviewPanelProps = { study: Study };

/** The review state of a study and the review actions this user may take on it. */
export function ReviewPanel({ study }: ReviewPanelProps) {
  const session = useSignedInSession();
  const revisions = useRevisions(study.id);
  const reviews = useReviews(study.id);
  const submit = useSubmitForReview(study.id);

  const canEdit = canEditStudy(session, study);
  const isReviewer = canReviewInTeam(session, study);
  const currentRevision = revisions.data?.find((revision) => revision.number === study.version);
  const wroteCurrentRevision = currentRevision?.author?.id === session.user.id;
  // Decisions wait until the revision's author is known: nobody reviews a revision they saved.
  const canDecide = isReviewer && study.status === 'in_review' && currentRevision !== undefined && !wroteCurrentRevision;
  const canSubmit = canEdit && (study.status === 'draft' || study.status === 'changes_requested');

  const reviewList = reviews.data ?? [];
  const copy = reviewCopy(study, reviewList, { canEdit, canDecide, wroteCurrentRevision, isReviewer });
  const sentBack = study.status === 'changes_requested' ? latestReviewOn(reviewList, study.version) : undefined;
  const tint = STATUS_COLORS[study.status];

  return (
    <View
      role="region"
      aria-label="Review"
      testID="review-panel"
      style={[styles.banner, { borderLeftColor: tint.fg, backgroundColor: tint.bg }]}
    >
      <Text variant="heading">{copy.headline}</Text>
      {copy.detail ? <Text>{copy.detail}</Text> : null}
      {sentBack?.comment ? <Text style={styles.quote}>“{sentBack.comment}”</Text> : null}
      {canSubmit ? (
        <Button
          label={study.status === 'draft' ? 'Submit for review' : 'Submit again for review'}
          onPress={() => submit.mutate()}
          busy={submit.isPending}
          style={styles.action}
        />
      ) : null}
      {submit.isError ? <InlineAlert message={errorMessage(submit.error)} /> : null}
      {canDecide ? <ReviewDecision studyId={study.id} revision={study.version} /> : null}
      <ReviewHistory reviews={reviewList} />
    </View>
  );
}

const styles = StyleSheet.create({
  banner: {
    gap: spacing.sm,
    padding: spacing.lg,
    borderRadius: radius.lg,
    borderLeftWidth: 4,
  },
  quote: { paddingLeft: spacing.md, borderLeftWidth: 2, borderLeftColor: color.borderStrong },
  action: { alignSelf: 'flex-start' },
});
