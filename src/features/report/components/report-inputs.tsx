import { useIsWide } from '@/components/ui';
import type { RailSource, Tap } from '@/core/rails';
import type { AmbientPoint, StudyDocument } from '@/core/study';
import { FactGrid } from '@/features/studies/components/fact-grid';
import { conditionFacts, profileFacts } from '@/features/studies/document-facts';
import { formatDuration, formatQuantity } from '@/features/studies/quantity-format';

import { deviceRows, packageTerms, segmentRows, sinkRows, type DeviceRow, type SegmentRow, type SinkRow } from '../input-rows';
import { circuitText, railPlanFacts } from '../rail-plan-rows';
import { usePrinting } from '../use-printing';
import { ReportPart, ReportSection } from './report-section';
import { ReportTable, type ReportColumn } from './report-table';

/** Long tables stop here in the report; the rest are counted. */
export const SEGMENTS_LISTED = 25;
const AMBIENT_POINTS_LISTED = 12;

const DEVICE_COLUMNS: readonly ReportColumn<DeviceRow>[] = [
  { label: 'Device', cell: (d) => d.id, flex: 0.8 },
  { label: 'Name', cell: (d) => d.name, flex: 2.2 },
  { label: 'Kind', cell: (d) => d.kind, flex: 1 },
  { label: 'Parts', cell: (d) => d.count, flex: 0.6 },
  { label: 'Tj,max', cell: (d) => d.tjMax, flex: 0.8 },
  { label: 'Sink', cell: (d) => d.sink, flex: 0.7 },
];

const PACKAGE_COLUMNS: readonly ReportColumn<DeviceRow & { terms: string }>[] = [
  { label: 'Device', cell: (d) => d.id, flex: 0.8 },
  { label: 'Package model', cell: (d) => d.packageModel, flex: 1.6 },
  { label: 'Terms or stages', cell: (d) => d.terms, flex: 2.4 },
  { label: 'Interface', cell: (d) => d.interface, flex: 1.6 },
];

const ELECTRICAL_COLUMNS: readonly ReportColumn<DeviceRow>[] = [
  { label: 'Device', cell: (d) => d.id, flex: 0.8 },
  { label: 'Electrical model', cell: (d) => d.electrical, flex: 5.6 },
];

const SINK_COLUMNS: readonly ReportColumn<SinkRow>[] = [
  { label: 'Sink', cell: (s) => s.id, flex: 0.8 },
  { label: 'Name', cell: (s) => s.name, flex: 2 },
  { label: 'Rθsa', cell: (s) => s.rth, flex: 1.3 },
  { label: 'Cooling', cell: (s) => s.cooling, flex: 1.6 },
  { label: 'Heat capacity', cell: (s) => s.capacity, flex: 1 },
  { label: 'Leads to', cell: (s) => s.to, flex: 0.9 },
];

const SEGMENT_COLUMNS: readonly ReportColumn<SegmentRow>[] = [
  { label: '#', cell: (s) => String(s.index), flex: 0.4 },
  { label: 'Starts', cell: (s) => s.start, flex: 0.8 },
  { label: 'Label', cell: (s) => s.label, flex: 2 },
  { label: 'Length', cell: (s) => s.duration, flex: 0.8 },
  { label: 'Operating point', cell: (s) => s.drive, flex: 2.6 },
];

const AMBIENT_COLUMNS: readonly ReportColumn<AmbientPoint>[] = [
  { label: 'From', cell: (p) => formatDuration(p.timeS) },
  { label: 'Ambient', cell: (p) => formatQuantity(p.temperatureC, '°C') },
];

const SOURCE_COLUMNS: readonly ReportColumn<RailSource>[] = [
  { label: 'Source', cell: (s) => s.id },
  { label: 'Open-circuit voltage', cell: (s) => formatQuantity(s.vocV, 'V') },
  { label: 'Output resistance', cell: (s) => formatQuantity(s.rsOhm, 'Ω') },
  { label: 'Current rating', cell: (s) => formatQuantity(s.imaxA, 'A') },
];

const TAP_COLUMNS: readonly ReportColumn<Tap & { index: number }>[] = [
  { label: 'Tap', cell: (t) => `${t.index + 1}. ${t.name}`, flex: 1.5 },
  { label: 'Circuit', cell: (t) => circuitText(t.circuit), flex: 3 },
];

/** On a phone one block per device holds it all; three tables side by side would repeat the device. */
const PHONE_DEVICE_COLUMNS: readonly ReportColumn<DeviceRow & { terms: string }>[] = [
  ...DEVICE_COLUMNS,
  ...PACKAGE_COLUMNS.slice(1),
  ...ELECTRICAL_COLUMNS.slice(1),
];

export type ReportInputsProps = { document: StudyDocument; raw: unknown };

/** The design inputs in readable tables, as the solver read them (defaults filled in, groups laid out). */
export function ReportInputs({ document, raw }: ReportInputsProps) {
  const printing = usePrinting();
  const wide = useIsWide() || printing;
  const devices = deviceRows(document, raw);
  const packages = devices.map((row, i) => ({ ...row, terms: packageTerms(document.devices[i].package) }));
  const targets = document.devices.map((d) => `${d.id} ${formatQuantity(d.tjMaxC - document.marginK, '°C')}`).join(', ');
  const ambient = document.ambient;
  return (
    <ReportSection name="inputs" title="Inputs">
      <ReportPart title="Conditions">
        <FactGrid facts={[...conditionFacts(document), { label: 'Junction target (Tj,max − margin)', value: targets }]} />
        {ambient.kind === 'profile' ? (
          <ReportTable
            label="Ambient profile"
            rows={ambient.points}
            rowKey={(p) => String(p.timeS)}
            columns={AMBIENT_COLUMNS}
            limit={AMBIENT_POINTS_LISTED}
            noun={['point', 'points']}
          />
        ) : null}
      </ReportPart>
      <ReportPart title={document.devices.length === 1 ? 'Pass device' : 'Pass devices'}>
        {wide ? (
          <>
            <ReportTable label="Pass devices" rows={devices} rowKey={(d) => d.id} columns={DEVICE_COLUMNS} />
            <ReportTable label="Package models and interfaces" rows={packages} rowKey={(d) => d.id} columns={PACKAGE_COLUMNS} />
            <ReportTable label="Electrical models" rows={devices} rowKey={(d) => d.id} columns={ELECTRICAL_COLUMNS} />
          </>
        ) : (
          <ReportTable label="Pass devices" rows={packages} rowKey={(d) => d.id} columns={PHONE_DEVICE_COLUMNS} />
        )}
      </ReportPart>
      <ReportPart title={document.sinks.length === 1 ? 'Sink' : 'Sinks'}>
        <ReportTable label="Sinks" rows={sinkRows(document)} rowKey={(s) => s.id} columns={SINK_COLUMNS} />
      </ReportPart>
      <ReportPart title="Load profile">
        <FactGrid facts={profileFacts(document.profile)} />
        <ReportTable
          label="Profile segments"
          rows={segmentRows(document)}
          rowKey={(s) => String(s.index)}
          columns={SEGMENT_COLUMNS}
          limit={SEGMENTS_LISTED}
          noun={['segment', 'segments']}
        />
      </ReportPart>
      {document.railPlan ? (
        <ReportPart title="Rail plan">
          <FactGrid facts={railPlanFacts(document.railPlan)} />
          <ReportTable label="Sources" rows={document.railPlan.sources} rowKey={(s) => s.id} columns={SOURCE_COLUMNS} />
          <ReportTable
            label="Taps"
            rows={document.railPlan.taps.map((tap, index) => ({ ...tap, index }))}
            rowKey={(t) => String(t.index)}
            columns={TAP_COLUMNS}
          />
        </ReportPart>
      ) : null}
    </ReportSection>
  );
}

