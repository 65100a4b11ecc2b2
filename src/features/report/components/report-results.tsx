import { useMemo } from 'react';

import { Text } from '@/components/ui';
import type { StudyResult } from '@/core/study';
import { DeviceTable } from '@/features/results/components/device-table';
import { SinkTable } from '@/features/results/components/sink-table';
import { VerdictPanel } from '@/features/results/components/verdict-panel';
import { studyVerdict } from '@/features/results/verdict';

import { generalWarnings } from '../result-warnings';
import { ReportCurves } from './report-curves';
import { ReportEvents } from './report-events';
import { ReportRailPlan } from './report-rail-plan';
import { ReportPart, ReportSection } from './report-section';
import { ReportSoa } from './report-soa';

export type ReportResultsProps = { result: StudyResult };

/** The answer and what shows it: verdict, heat curves, device and sink peaks, SOA, rail plan, events. */
export function ReportResults({ result }: ReportResultsProps) {
  const verdict = useMemo(() => studyVerdict(result), [result]);
  const devices = useMemo(() => Object.values(result.devices), [result]);
  const warnings = useMemo(() => generalWarnings(result), [result]);
  return (
    <ReportSection name="results" title="Results">
      {/* Every warning is listed below: the panel's own list stops after a few behind a button. */}
      <VerdictPanel verdict={verdict} warnings={[]} />
      {warnings.length > 0 ? (
        <ReportPart title={warnings.length === 1 ? 'Solver warning' : 'Solver warnings'}>
          {warnings.map((warning) => (
            <Text key={warning} variant="caption">
              {`• ${warning}`}
            </Text>
          ))}
        </ReportPart>
      ) : null}
      <ReportPart title="Heat curves">
        <ReportCurves result={result} />
      </ReportPart>
      <ReportPart title={devices.length === 1 ? 'Device' : 'Devices'}>
        <DeviceTable devices={devices} />
      </ReportPart>
      <ReportPart title="Sinks">
        <SinkTable result={result} />
      </ReportPart>
      {Object.keys(result.soa).length > 0 ? <ReportSoa soa={result.soa} /> : null}
      {result.railPlan ? <ReportRailPlan rail={result.railPlan} /> : null}
      <ReportEvents events={result.events} counts={result.eventCounts} />
    </ReportSection>
  );
}
