import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { errorMessage, errorStatus } from '@/api';
import { Card, EmptyState, ErrorState, InlineAlert, LoadingState, Page, Text, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { useSignedInSession } from '@/features/auth/api';
import { useStudy } from '@/features/studies/api';
import { BackLink } from '@/features/studies/components/back-link';
import { StudyInputs } from '@/features/studies/components/study-inputs';
import { formatDateTime } from '@/features/studies/format';
import { canEditStudy } from '@/features/studies/study-permissions';

import { useRevision } from './api';
import { ChangesToCurrent } from './components/changes-to-current';
import { RestoreRevision } from './components/restore-revision';

export type RevisionScreenProps = { studyId: string; number: string };

/** One saved revision, read-only, compared with the current version, with restore for editors. */
export function RevisionScreen({ studyId, number }: RevisionScreenProps) {
  const router = useRouter();
  const wide = useIsWide();
  const session = useSignedInSession();
  const study = useStudy(studyId);
  const view = useRevision(studyId, number);

  let body;
  if (view.isPending || study.isPending) {
    body = <LoadingState label="Loading revision…" />;
  } else if (errorStatus(view.error) === 404 || errorStatus(study.error) === 404) {
    body = <EmptyState title="Revision not found" message="The study or this revision of it does not exist in your teams." />;
  } else if (view.isError || study.isError) {
    const failed = view.isError ? view : study;
    body = (
      <ErrorState
        title="Could not load the revision"
        message={errorMessage(failed.error)}
        onRetry={() => failed.refetch()}
        retrying={failed.isFetching}
      />
    );
  } else {
    const { revision } = view.data;
    const isCurrent = revision.number === view.data.current;
    body = (
      <>
        <InlineAlert
          tone="info"
          message={`Read-only: revision ${revision.number} as ${revision.author?.name ?? 'a former member'} saved it, ${formatDateTime(revision.createdAt)}.`}
        />
        <View style={styles.heading}>
          <Text variant="caption" tone="faint">
            Revision {revision.number}
            {isCurrent ? ' · current' : ''}
          </Text>
          <Text variant={wide ? 'display' : 'title'}>{revision.title}</Text>
        </View>
        <ChangesToCurrent
          number={revision.number}
          current={view.data.current}
          changes={view.data.changesToCurrent}
          lines={view.data.summaryToCurrent}
        />
        {!isCurrent && canEditStudy(session, study.data) ? (
          <RestoreRevision
            studyId={study.data.id}
            view={view.data}
            onDone={(saved) => router.replace(`/studies/${saved.id}`)}
          />
        ) : null}
        <Card>
          <Text variant="heading">Description</Text>
          <Text tone={revision.description ? 'default' : 'muted'}>{revision.description || 'No description.'}</Text>
        </Card>
        <StudyInputs document={revision.document} />
      </>
    );
  }

  return (
    <Page width="readable">
      <BackLink href={`/studies/${studyId}`} label={study.data ? study.data.title : 'Study'} />
      {body}
    </Page>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs },
});
