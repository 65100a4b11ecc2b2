import { memo, useDeferredValue, useEffect, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { HeatCurvesChart } from '@/charts/heat-curves-chart';
import { Button, Card, InlineAlert, LoadingState, Text, saveTextFile, useIsWide } from '@/components/ui';
import type { StudyResult } from '@/core/study';
import { spacing } from '@/constants/theme';

import { DeviceTable } from './components/device-table';
import { EventList } from './components/event-list';
import { LifetimePanel } from './components/lifetime-panel';
import { RailPlanPanel } from './components/rail-plan-panel';
import { ResultSection } from './components/result-section';
import { ResultsCaution } from './components/results-caution';
import { SinkTable } from './components/sink-table';
import { SoaPanel } from './components/soa-panel';
import { TwoColumns } from './components/two-columns';
import { UpdatingNote } from './components/updating-note';
import { VerdictPanel } from './components/verdict-panel';
import { curvesCsv, curvesFileName } from '@/charts/curves-csv';
import { mainsCaution, type MainsCaution } from './mains-hint';
import { useStudyResult } from './use-study-result';
import type { VerdictSummary } from './verdict-summary';

export type StudyResultsProps = {
  /** The saved study document, as the API returns it. */
  document: unknown;
  /** A time picked on the chart (s), e.g. to pin a comment to it. */
  onPickTime?: (timeS: number) => void;
  /** Chart points per node to solve for (the core's default without it); the live editor asks for fewer. */
  seriesPoints?: number;
  /** Show the verdict line as soon as the worker has it, the curves and tables once the full result follows (the live editor). */
  verdictFirst?: boolean;
};

type SolvedProps = { summary: VerdictSummary; result: StudyResult | null; updating: boolean; mains: MainsCaution | null; onPickTime?: (timeS: number) => void };
type DetailsProps = { result: StudyResult; mains: MainsCaution | null; onPickTime?: (timeS: number) => void; onDrawn: (result: StudyResult) => void };

/**
 * The verdict follows each result at once (with `verdictFirst`, ahead of it); the curves, tables
 * and panels below follow a moment later (a deferred render React may interrupt), so the
 * verdict and the fields never wait on them. While a newer edit is solved (`updating`) they
 * stay as drawn: drawing them for a result already superseded would take the time the solve needs.
 */
function Solved({ summary, result, updating, mains, onPickTime }: SolvedProps) {
  const [drawn, setDrawn] = useState<StudyResult | null>(result);
  const details = useDeferredValue(updating ? drawn : result);
  return (
    <>
      {/* Warnings the SOA and rail-plan panels show in full are not repeated above the curves. */}
      <VerdictPanel verdict={summary.verdict} warnings={summary.ownWarnings} />
      {details ? <Details result={details} mains={mains} onPickTime={onPickTime} onDrawn={setDrawn} /> : null}
    </>
  );
}

const Details = memo(function Details({ result, mains, onPickTime, onDrawn }: DetailsProps) {
  useEffect(() => onDrawn(result), [result, onDrawn]);
  const wide = useIsWide();
  const [cursorS, setCursorS] = useState<number | null>(null);
  const devices = useMemo(() => Object.values(result.devices), [result]);
  const hasSoa = Object.keys(result.soa).length > 0;
  const planSink = result.railPlan ? result.sinks[result.devices[result.railPlan.device]?.sink ?? ''] : undefined;
  const [saveError, setSaveError] = useState<string | null>(null);

  const download = async () => {
    setSaveError(null);
    try {
      await saveTextFile(curvesFileName(result.title), curvesCsv(result.series ?? {}));
    } catch (error) {
      setSaveError(`The CSV could not be saved: ${error instanceof Error ? error.message : String(error)}`);
    }
  };

  return (
    <>
      <ResultSection title="Heat curves">
        <HeatCurvesChart
          result={result}
          cursorS={cursorS}
          onCursorChange={setCursorS}
          onPickTime={onPickTime}
          height={wide ? 360 : 280}
        />
        <View style={styles.actions}>
          <Button label="Download curves (CSV)" variant="secondary" onPress={download} disabled={!result.series} />
        </View>
        {saveError ? <InlineAlert message={saveError} /> : null}
      </ResultSection>
      <ResultSection title={devices.length === 1 ? 'Device' : 'Devices'}>
        <DeviceTable devices={devices} />
      </ResultSection>
      <TwoColumns firstShare={0.45}>
        {[
          <ResultSection key="sinks" title="Sinks">
            <SinkTable result={result} />
          </ResultSection>,
          <ResultSection key="events" title="Events">
            <EventList events={result.events} counts={result.eventCounts} selectedS={cursorS} onSelect={setCursorS} />
          </ResultSection>,
        ]}
      </TwoColumns>
      {hasSoa ? (
        <ResultSection title="Safe operating area">
          <SoaPanel soa={result.soa} selectedS={cursorS} onSelectTime={setCursorS} />
        </ResultSection>
      ) : null}
      {result.railPlan ? (
        <ResultSection title="Rail plan">
          <RailPlanPanel
            plan={result.railPlan}
            sink={planSink}
            selectedS={cursorS}
            onSelectTime={setCursorS}
          />
        </ResultSection>
      ) : null}
      {result.lifetime || result.touch || result.site ? (
        <ResultSection title="Life, touch and site">
          <LifetimePanel lifetime={result.lifetime} touch={result.touch} site={result.site} />
        </ResultSection>
      ) : null}
      <ResultsCaution hotSinks={Object.values(result.sinks)} mains={mains} />
    </>
  );
});

/** The study's answer, solved in the client: verdict, heat curves, per-device and per-sink peaks, events. */
export const StudyResults = memo(function StudyResults({ document, onPickTime, seriesPoints, verdictFirst }: StudyResultsProps) {
  const state = useStudyResult(document, seriesPoints, verdictFirst);
  const mains = useMemo(() => mainsCaution(document), [document]);
  if (state.kind === 'empty') return null;
  return (
    <Card style={styles.card}>
      {/* The updating note sits beside the heading, so its coming and going does not move the verdict and curves below. */}
      <View style={styles.headingRow}>
        <Text variant="heading">Results</Text>
        {state.kind !== 'solving' && state.updating ? <UpdatingNote /> : null}
      </View>
      {state.kind === 'solving' ? <LoadingState label="Solving the study…" /> : null}
      {state.kind === 'invalid' ? <Text tone="muted">No results: the saved document could not be read (see the design inputs).</Text> : null}
      {state.kind === 'failed' ? <InlineAlert message={`The study could not be solved: ${state.message}`} /> : null}
      {/* One element for both states, so the curves and tables stay mounted when the full result follows its verdict. */}
      {state.kind === 'ok' || state.kind === 'verdict' ? <Solved summary={state.summary} result={state.kind === 'ok' ? state.result : state.previous} updating={Boolean(state.updating)} mains={mains} onPickTime={onPickTime} /> : null}
    </Card>
  );
});

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  headingRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: spacing.md, rowGap: spacing.xs },
});
