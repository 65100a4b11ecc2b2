import { StyleSheet, View } from 'react-native';

import { errorMessage, errorStatus } from '@/api';
import { EmptyState, ErrorState, LoadingState, Page } from '@/components/ui';
import { useSignedInSession } from '@/features/auth/api';
import { useStudy } from '@/features/studies/api';
import { BackLink } from '@/features/studies/components/back-link';
import { canEditStudy, membershipFor } from '@/features/studies/study-permissions';

import { EditorForm } from './editor-form';

export type StudyEditorScreenProps = { id: string };

/** Edits one study's design inputs, for the people who may (its owner-role members and its designer-author). */
export function StudyEditorScreen({ id }: StudyEditorScreenProps) {
  const session = useSignedInSession();
  const study = useStudy(id);

  if (study.isSuccess && canEditStudy(session, study.data)) return <EditorForm key={study.data.id} study={study.data} />;

  let body;
  if (study.isPending) body = <LoadingState label="Loading study…" />;
  else if (study.isError && errorStatus(study.error) === 404) {
    body = <EmptyState title="Study not found" message="It may have been deleted, or it belongs to a team you are not a member of." />;
  } else if (study.isError) {
    body = <ErrorState title="Could not load the study" message={errorMessage(study.error)} onRetry={() => study.refetch()} retrying={study.isFetching} />;
  } else {
    const role = membershipFor(session, study.data)?.role;
    body = (
      <EmptyState
        title="You cannot edit this study"
        message={role === 'reviewer' ? 'Reviewers read, comment and decide on studies; they do not edit them.' : 'Designers edit the studies they wrote; ask its author or a team owner.'}
      />
    );
  }
  return (
    <Page width="readable">
      <View style={styles.back}>
        <BackLink href={`/studies/${id}`} label="Back to the study" />
      </View>
      {body}
    </Page>
  );
}

const styles = StyleSheet.create({
  back: { alignSelf: 'flex-start' },
});
