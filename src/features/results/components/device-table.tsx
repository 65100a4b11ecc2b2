import type { DeviceResult } from '@/core/study';
import { formatDuration, formatQuantity } from '@/features/studies/quantity-format';

import { ResultTable, type ResultColumn } from './result-table';

const at = (timeS: number) => `at ${formatDuration(timeS)}`;

const COLUMNS: readonly ResultColumn<DeviceResult>[] = [
  {
    label: 'Device',
    cell: (d) => ({ text: d.id, note: d.count > 1 ? `${d.count} in parallel, values per part` : d.name }),
  },
  { label: 'Peak junction', cell: (d) => ({ text: formatQuantity(d.peakJunctionC, '°C'), note: at(d.peakTimeS) }) },
  { label: 'Peak case', cell: (d) => ({ text: formatQuantity(d.peakCaseC, '°C'), note: at(d.peakCaseTimeS) }) },
  {
    label: 'Margin to Tj,max',
    cell: (d) => ({ text: formatQuantity(d.marginToMaxK, 'K'), note: `Tj,max ${formatQuantity(d.tjMaxC, '°C')}`, tone: d.marginToMaxK <= 0 ? 'danger' : 'default' }),
  },
  {
    label: 'Margin to target',
    cell: (d) => ({ text: formatQuantity(d.marginToTargetK, 'K'), note: `target ${formatQuantity(d.targetC, '°C')}`, tone: d.marginToTargetK <= 0 ? 'danger' : 'default' }),
  },
  {
    label: 'Above target',
    cell: (d) => ({ text: d.timeAboveTargetS > 0 ? formatDuration(d.timeAboveTargetS) : 'never', tone: d.timeAboveTargetS > 0 ? 'danger' : 'default' }),
  },
  {
    label: 'Power, one part',
    cell: (d) => ({ text: `${formatQuantity(d.peakPowerW, 'W')} peak`, note: `${formatQuantity(d.averagePowerW, 'W')} average` }),
  },
  { label: 'Shutdowns', cell: (d) => ({ text: String(d.shutdowns), tone: d.shutdowns > 0 ? 'danger' : 'default' }) },
];

export type DeviceTableProps = { devices: readonly DeviceResult[] };

export function DeviceTable({ devices }: DeviceTableProps) {
  return <ResultTable label="Devices" rows={devices} rowKey={(d) => d.id} columns={COLUMNS} />;
}
