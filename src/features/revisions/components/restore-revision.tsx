import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, ConfirmRow, InlineAlert } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { studyKey } from '@/features/studies/api';
import { VersionConflict } from '@/features/studies/components/version-conflict';
import { formatDateTime } from '@/features/studies/format';
import type { Study } from '@/features/studies/types';
import { conflictingStudy } from '@/features/studies/version-conflict';

import { useRestoreRevision } from '../api';
import type { RevisionView } from '../types';

export type RestoreRevisionProps = {
  studyId: number;
  view: RevisionView;
  /** Called with the study after the restore, or with the server's version when the user takes it. */
  onDone: (study: Study) => void;
};

type Conflict = { baseVersion: number; current: Study };

/** Restores the revision as a new one, after a confirmation; a stale base shows both versions. */
export function RestoreRevision({ studyId, view, onDone }: RestoreRevisionProps) {
  const queryClient = useQueryClient();
  const restore = useRestoreRevision(studyId);
  const [confirming, setConfirming] = useState(false);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const { number, title, createdAt } = view.revision;

  const send = (baseVersion: number) => {
    restore.mutate(
      { number, baseVersion },
      {
        onSuccess: (study) => {
          setConflict(null);
          onDone(study);
        },
        onError: (error) => {
          const current = conflictingStudy(error);
          if (current) setConflict({ baseVersion, current });
        },
        onSettled: () => setConfirming(false),
      },
    );
  };

  if (conflict) {
    return (
      <VersionConflict
        studyId={studyId}
        baseVersion={conflict.baseVersion}
        current={conflict.current}
        yours={{ title: `Restore revision ${number}`, lines: [`“${title}”, saved ${formatDateTime(createdAt)}`] }}
        busy={restore.isPending}
        onKeepMine={send}
        onTakeTheirs={(current) => {
          queryClient.setQueryData(studyKey(String(studyId)), current);
          setConflict(null);
          onDone(current);
        }}
      />
    );
  }

  return (
    <View style={styles.box}>
      {confirming ? (
        <ConfirmRow
          message={`Restore revision ${number}? Its content becomes revision ${view.current + 1}; the current version stays in the history.`}
          confirmLabel="Restore"
          busy={restore.isPending}
          onConfirm={() => send(view.current)}
          onCancel={() => setConfirming(false)}
        />
      ) : (
        <Button
          label="Restore this revision"
          variant="secondary"
          onPress={() => {
            restore.reset();
            setConfirming(true);
          }}
          style={styles.button}
        />
      )}
      {restore.isError && !conflictingStudy(restore.error) ? <InlineAlert message={errorMessage(restore.error)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  button: { alignSelf: 'flex-start' },
});
