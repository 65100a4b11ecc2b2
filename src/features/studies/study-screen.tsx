import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { errorMessage, errorStatus } from '@/api';
import { Button, Card, EmptyState, ErrorState, LoadingState, Page, Text, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { useSignedInSession } from '@/features/auth/api';
import { CommentsPanel } from '@/features/comments/comments-panel';
import { StudyReportActions } from '@/features/report/components/study-report-actions';
import { ReviewPanel } from '@/features/review/review-panel';
import { RankingPanel } from '@/features/heatsinks/components/ranking-panel';
import { HistoryPanel } from '@/features/revisions/history-panel';
import { StudyResults } from '@/features/results/study-results';
import { TolerancePanel } from '@/features/tolerance/components/tolerance-panel';

import { useStudy } from './api';
import { BackLink } from './components/back-link';
import { StudyInputs } from './components/study-inputs';
import { EstimateCaution } from './components/estimate-caution';
import { StatusBadge } from './components/status-badge';
import { StudyFacts } from './components/study-facts';
import { canEditStudy } from './study-permissions';

export type StudyScreenProps = { id: string };

/** Read-only view of one study: what it is, who owns it, and what its document holds. */
export function StudyScreen({ id }: StudyScreenProps) {
  const wide = useIsWide();
  const study = useStudy(id);
  const session = useSignedInSession();
  const router = useRouter();

  let body;
  if (study.isPending) {
    body = <LoadingState label="Loading study…" />;
  } else if (study.isError && errorStatus(study.error) === 404) {
    body = (
      <EmptyState
        title="Study not found"
        message="It may have been deleted, or it belongs to a team you are not a member of."
      />
    );
  } else if (study.isError) {
    body = (
      <ErrorState
        title="Could not load the study"
        message={errorMessage(study.error)}
        onRetry={() => study.refetch()}
        retrying={study.isFetching}
      />
    );
  } else {
    const data = study.data;
    body = (
      <>
        <View style={styles.heading}>
          <StatusBadge status={data.status} />
          <Text variant={wide ? 'display' : 'title'}>{data.title}</Text>
          {canEditStudy(session, data) ? <Button label="Edit" onPress={() => router.push(`/studies/${data.id}/edit`)} style={styles.edit} /> : null}
        </View>
        <StudyFacts study={data} />
        <StudyReportActions study={data} />
        <ReviewPanel study={data} />
        <Card>
          <Text variant="heading">Description</Text>
          <Text tone={data.description ? 'default' : 'muted'}>{data.description || 'No description.'}</Text>
        </Card>
        <StudyResults document={data.document} />
        <RankingPanel study={data} />
        <TolerancePanel study={data} />
        <StudyInputs document={data.document} />
        <CommentsPanel study={data} />
        <HistoryPanel study={data} />
        <EstimateCaution />
      </>
    );
  }

  return (
    <Page width="content">
      <BackLink href="/" label="Studies" />
      {body}
    </Page>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.sm },
  edit: { alignSelf: 'flex-start' },
});
