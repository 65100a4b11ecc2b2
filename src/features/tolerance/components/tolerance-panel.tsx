import { StyleSheet, View } from 'react-native';

import { Card, InlineAlert, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { useToleranceSweep } from '../use-tolerance-sweep';
import { ToleranceAnswer } from './tolerance-answer';
import { ToleranceForm } from './tolerance-form';

export type TolerancePanelProps = { study: { id: number; version: number; document: unknown } };

function Progress({ done, total, place }: { done: number; total: number | null; place: 'browser' | 'server' }) {
  const share = total ? done / total : null;
  const label = share === null ? `Sweeping ${place === 'browser' ? 'in this browser' : 'on the server'}…` : `Sweeping: ${done.toLocaleString('en')} of ${total!.toLocaleString('en')} runs`;
  return (
    <View style={styles.progress} accessibilityRole="progressbar" aria-label={label} aria-valuenow={share === null ? undefined : Math.round(share * 100)}>
      <Text variant="caption" tone="muted">
        {label}
      </Text>
      <View style={styles.track}>
        <View style={[styles.fill, { width: share === null ? '30%' : `${Math.max(2, share * 100)}%` }]} />
      </View>
    </View>
  );
}

/**
 * Tolerance and worst-case sweep of the saved study: the spreads a datasheet and a site have,
 * as corners or Monte Carlo, with the distribution of the peak junction temperature, the
 * chance of passing the target and Tj,max, the worst corner and what drives the spread.
 */
export function TolerancePanel({ study }: TolerancePanelProps) {
  const { state, run, cancel } = useToleranceSweep(study.id, study.document);
  if (!study.document) return null;
  return (
    <Card style={styles.card} testID="tolerance-panel">
      <Text variant="heading">Tolerance</Text>
      <Text tone="muted">Datasheet, site and load spreads applied to this study’s saved version; each run solves the whole profile for its junction peaks.</Text>
      <ToleranceForm running={state.kind === 'running'} fieldErrors={state.kind === 'failed' ? state.fields : {}} onRun={run} onStop={cancel} />
      {state.kind === 'running' ? <Progress done={state.done} total={state.total} place={state.place} /> : null}
      {state.kind === 'failed' ? <InlineAlert message={`The sweep could not run: ${state.message}`} /> : null}
      {state.kind === 'done' ? <ToleranceAnswer result={state.result} place={state.place} seconds={state.seconds} /> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  progress: { gap: spacing.xs },
  track: { height: 6, backgroundColor: color.surfaceMuted, borderRadius: radius.pill, overflow: 'hidden' },
  fill: { height: 6, backgroundColor: color.accent },
});
