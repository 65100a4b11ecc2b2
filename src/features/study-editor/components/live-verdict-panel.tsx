import { StyleSheet, View } from 'react-native';

import { InlineAlert, LoadingState, Text } from '@/components/ui';
import { UpdatingNote } from '@/features/results/components/updating-note';
import { VerdictPanel } from '@/features/results/components/verdict-panel';
import { spacing } from '@/constants/theme';

import type { LiveVerdict } from '../use-live-verdict';

export type LiveVerdictPanelProps = { state: LiveVerdict; stale: boolean };

/** The verdict line of the study as edited, solved again a moment after each change. */
export function LiveVerdictPanel({ state, stale }: LiveVerdictPanelProps) {
  return (
    <View style={styles.box} testID="live-verdict">
      {state.kind === 'waiting' ? (
        stale ? (
          <Text tone="muted">The verdict appears once the inputs have no problems.</Text>
        ) : (
          <LoadingState label="Solving the study…" />
        )
      ) : null}
      {state.kind === 'ok' ? <VerdictPanel verdict={state.verdict} warnings={state.warnings} /> : null}
      {state.kind === 'failed' ? <InlineAlert message={`The study could not be solved: ${state.message}`} /> : null}
      {/* The note's line stays while a verdict is shown, so the note coming and going does not move the editor below it (a long profile is costly to paint again). */}
      {state.kind !== 'waiting' ? <View style={styles.noteLine}>{state.updating ? <UpdatingNote /> : null}</View> : null}
      {stale && state.kind !== 'waiting' ? (
        <Text variant="caption" tone="muted">
          From the last inputs without problems; fix the problems above to update it.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xs },
  /** The updating note's height: a small activity indicator (20 px) beside a caption line. */
  noteLine: { minHeight: 20, justifyContent: 'center' },
});
