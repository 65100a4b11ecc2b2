import { useMemo, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, Card, ErrorState, LoadingState, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { formatQuantity } from '@/features/studies/quantity-format';

import { useSinkRanking } from '../api';
import { checkRankingForm, initialRankingForm, rankingDefaults } from '../ranking-form';
import { enclosureSentence, siteSentence, smallestSentence, steadySentence, thermalMassSentence } from '../ranking-text';
import type { RankingResponse } from '../ranking-types';
import { useDebouncedValue } from '../use-debounced-value';
import { RankingControls } from './ranking-controls';
import { RankingOthers } from './ranking-others';
import { RankingTable } from './ranking-table';

/** Typing pauses this long before the ranking runs again, ms. */
const DEBOUNCE_MS = 500;

export type RankingPanelProps = { study: { id: number; version: number; document: unknown } };

function Answer({ data }: { data: RankingResponse }) {
  const [showNotes, setShowNotes] = useState(false);
  const r = data.result;
  const gain = thermalMassSentence(r);
  const site = siteSentence(r);
  const enclosure = enclosureSentence(r);
  const notes = [...data.notes, ...r.assumptions];
  const s = r.scenario;
  return (
    <View style={styles.answer}>
      <Text variant="caption" tone="muted">
        {`${data.candidates} catalogue ${data.candidates === 1 ? 'sink' : 'sinks'} in the slot of ${data.sinkId}, ${s.airSpeedMPerS > 0 ? `air at ${formatQuantity(s.airSpeedMPerS, 'm/s')}` : 'still air'}, ambient ${formatQuantity(s.ambientC, '°C')}, margin ${formatQuantity(s.marginK, 'K')}.`}
      </Text>
      {site ? (
        <Text variant="caption" tone="muted" testID="ranking-site">
          {site}
        </Text>
      ) : null}
      {enclosure ? (
        <Text variant="caption" tone="muted" testID="ranking-enclosure">
          {enclosure}
        </Text>
      ) : null}
      <View testID="ranking-answer" style={[styles.box, r.smallest ? styles.pass : styles.fail]}>
        <Text variant="bodyStrong" style={r.smallest ? styles.passText : styles.failText}>
          {smallestSentence(r)}
        </Text>
        <Text tone="muted">{steadySentence(r)}</Text>
        {gain ? <Text>{gain}</Text> : null}
      </View>
      {r.passing.length > 0 ? (
        <RankingTable label="Passing heatsinks" sinks={r.passing} highlight={r.smallest?.id ?? null} />
      ) : (
        <Text tone="muted">No sink of the catalogue keeps every junction below its target in this scenario.</Text>
      )}
      <RankingOthers failing={r.failing} excluded={r.excluded} />
      <View style={styles.notes}>
        <Button
          variant="ghost"
          label={showNotes ? 'Hide notes and assumptions' : `Notes and assumptions (${notes.length})`}
          onPress={() => setShowNotes((v) => !v)}
          style={styles.toggle}
        />
        {showNotes ? (
          <View role="list" aria-label="Notes and assumptions" style={styles.noteList}>
            {notes.map((n) => (
              <Text key={n} role="listitem" variant="caption" tone="muted">
                {`• ${n}`}
              </Text>
            ))}
          </View>
        ) : null}
      </View>
    </View>
  );
}

/**
 * Every heatsink of the team's catalogue simulated on this study's real profile (saved
 * version), in one sink slot, with what-ifs: passing ones sorted, the smallest highlighted,
 * the steady answer beside it, failing and left-out ones folded away.
 */
export function RankingPanel({ study }: RankingPanelProps) {
  const defaults = useMemo(() => rankingDefaults(study.document), [study.document]);
  const [form, setForm] = useState(() => initialRankingForm(defaults));
  const check = useMemo(() => checkRankingForm(form), [form]);
  // The first ranking runs at once (the debounced value starts as the first one).
  const query = useDebouncedValue(check.query, DEBOUNCE_MS);
  const ranking = useSinkRanking(study.id, study.version, query);

  if (defaults.sinks.length === 0) return null;

  return (
    <Card style={styles.card} testID="ranking-panel">
      <View style={styles.head}>
        <Text variant="heading">Heatsink ranking</Text>
        {ranking.isFetching ? <ActivityIndicator color={color.accent} accessibilityLabel="Ranking…" /> : null}
      </View>
      <Text tone="muted">
        Every heatsink of the team catalogue simulated on this study’s saved profile in one sink slot, with its own thermal mass.
      </Text>
      <RankingControls form={form} defaults={defaults} errors={check.errors} onChange={setForm} />
      {ranking.isError ? (
        <ErrorState title="Could not rank the heatsinks" message={errorMessage(ranking.error)} onRetry={() => ranking.refetch()} retrying={ranking.isFetching} />
      ) : ranking.data ? (
        <View style={ranking.isPlaceholderData ? styles.stale : undefined}>
          <Answer data={ranking.data} />
        </View>
      ) : check.query ? (
        <LoadingState label="Ranking the catalogue…" />
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  answer: { gap: spacing.md },
  box: { gap: spacing.xs, padding: spacing.md, borderRadius: radius.md, borderLeftWidth: 4 },
  pass: { backgroundColor: color.successSoft, borderLeftColor: color.success },
  fail: { backgroundColor: color.dangerSoft, borderLeftColor: color.danger },
  passText: { color: color.success },
  failText: { color: color.danger },
  stale: { opacity: 0.6 },
  notes: { gap: spacing.xs },
  toggle: { alignSelf: 'flex-start' },
  noteList: { gap: spacing.xxs },
});
