import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, Card, ErrorState, LoadingState, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import type { Study } from '@/features/studies/types';

import { useRevisions } from './api';
import { RevisionItem } from './components/revision-item';

export type HistoryPanelProps = { study: Study };

const FIRST_SHOWN = 5;

/** Every saved revision of the study, newest first, with what changed in each. */
export function HistoryPanel({ study }: HistoryPanelProps) {
  const revisions = useRevisions(study.id);
  const [showAll, setShowAll] = useState(false);
  const list = revisions.data ?? [];
  const shown = showAll ? list : list.slice(0, FIRST_SHOWN);

  return (
    <Card role="region" aria-label="History" style={styles.card}>
      <View style={styles.head}>
        <Text variant="heading">History</Text>
        {revisions.data ? (
          <Text variant="caption" tone="faint">
            {list.length} {list.length === 1 ? 'revision' : 'revisions'}
          </Text>
        ) : null}
      </View>
      <Text variant="caption" tone="muted">
        Every save keeps a revision. Open one to read it as it was, compare it with the current version or restore it.
      </Text>
      {revisions.isPending ? <LoadingState label="Loading history…" /> : null}
      {revisions.isError ? (
        <ErrorState
          title="Could not load the history"
          message={errorMessage(revisions.error)}
          onRetry={() => revisions.refetch()}
          retrying={revisions.isFetching}
        />
      ) : null}
      {shown.map((revision, index) => (
        <View key={revision.number} style={index > 0 ? styles.divider : undefined}>
          <RevisionItem studyId={study.id} revision={revision} isCurrent={revision.number === study.version} />
        </View>
      ))}
      {list.length > FIRST_SHOWN && !showAll ? (
        <Button label={`Show all ${list.length} revisions`} variant="ghost" onPress={() => setShowAll(true)} style={styles.more} />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.xs },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: spacing.md },
  divider: { borderTopWidth: 1, borderTopColor: color.border },
  more: { alignSelf: 'flex-start' },
});
