import { Text } from '@/components/ui';
import type { EventKind, StudyEvent } from '@/core/study';
import { eventCountsText, eventText, formatEventTime } from '@/features/results/event-text';

import { ReportPart } from './report-section';
import { ReportTable, type ReportColumn } from './report-table';

/** Events listed in the report; the counts cover them all. */
export const EVENTS_LISTED = 20;

type EventRow = StudyEvent & { index: number };

const COLUMNS: readonly ReportColumn<EventRow>[] = [
  { label: 'Time', cell: (e) => formatEventTime(e.timeS), flex: 1 },
  { label: 'Event', cell: (e) => eventText(e).title, flex: 1.6 },
  { label: 'Detail', cell: (e) => eventText(e).detail, flex: 3.4 },
];

export type ReportEventsProps = { events: readonly StudyEvent[]; counts: Record<EventKind, number> };

/** How many shutdowns, dropouts, current limits and tap changes happened, and the first of them. */
export function ReportEvents({ events, counts }: ReportEventsProps) {
  const total = Object.values(counts).reduce((a, b) => a + b, 0);
  return (
    <ReportPart title="Events">
      {total === 0 ? (
        <Text>No dropout, current limit, tap change or thermal shutdown during the run.</Text>
      ) : (
        <>
          <Text>{`${eventCountsText(counts)}.`}</Text>
          <ReportTable
            label="Events"
            rows={events.map((event, index) => ({ ...event, index }))}
            rowKey={(e) => String(e.index)}
            columns={COLUMNS}
            limit={EVENTS_LISTED}
            noun={['event', 'events']}
          />
        </>
      )}
    </ReportPart>
  );
}
