import type { EventKind, StudyEvent } from '@/core/study';
import { formatDuration, formatQuantity } from '@/features/studies/quantity-format';

export const EVENT_LABELS: Record<EventKind, { one: string; many: string }> = {
  shutdown: { one: 'thermal shutdown', many: 'thermal shutdowns' },
  resume: { one: 'resume after shutdown', many: 'resumes after shutdown' },
  dropout: { one: 'dropout', many: 'dropouts' },
  'current-limit': { one: 'current limit', many: 'current limits' },
  'tap-change': { one: 'tap change', many: 'tap changes' },
};

export type EventText = { title: string; detail: string };

/** What an event means, in a title ("Q1 thermal shutdown") and a line of values. */
export function eventText(event: StudyEvent): EventText {
  switch (event.kind) {
    case 'shutdown':
      return { title: `${event.device} thermal shutdown`, detail: `junction at ${formatQuantity(event.junctionC, '°C')}, output off` };
    case 'resume':
      return { title: `${event.device} resumes`, detail: `junction cooled to ${formatQuantity(event.junctionC, '°C')}` };
    case 'dropout':
      return {
        title: `Dropout, ${event.devices.join(', ')}`,
        detail: `${formatQuantity(event.voutV, 'V')} out instead of ${formatQuantity(event.requestedVoutV, 'V')} from ${formatQuantity(event.vinV, 'V')} in (dropout ${formatQuantity(event.dropoutV, 'V')}), for ${formatDuration(event.endS - event.timeS)}`,
      };
    case 'current-limit':
      return {
        title: `Current limit, ${event.devices.join(', ')}`,
        detail: `${formatQuantity(event.deliveredA, 'A')} delivered of ${formatQuantity(event.requestedA, 'A')} asked, ${formatQuantity(event.differentialV, 'V')} across, for ${formatDuration(event.endS - event.timeS)}`,
      };
    case 'tap-change':
      return { title: `Tap change to ${event.toName}`, detail: `from ${event.fromName}, sensed ${formatQuantity(event.sensedV, 'V')}` };
  }
}

/** "367 thermal shutdowns, 367 resumes after shutdown" (kinds that happened, in a fixed order). */
export function eventCountsText(counts: Record<EventKind, number>): string {
  return (Object.keys(EVENT_LABELS) as EventKind[])
    .filter((kind) => counts[kind] > 0)
    .map((kind) => `${counts[kind]} ${counts[kind] === 1 ? EVENT_LABELS[kind].one : EVENT_LABELS[kind].many}`)
    .join(', ');
}

/**
 * An event's time precise enough to tell close events apart: "38.2 s", "13 min 24.7 s",
 * "2 h 03 min 10 s".
 */
export function formatEventTime(timeS: number): string {
  if (timeS < 1) return `${Number(timeS.toPrecision(3))}\u00a0s`;
  if (timeS < 120) return `${timeS.toFixed(1)}\u00a0s`;
  const tenths = Math.round(timeS * 10);
  const seconds = (tenths % 600) / 10;
  const minutes = Math.floor(tenths / 600);
  if (minutes < 120) return `${minutes}\u00a0min ${seconds.toFixed(1)}\u00a0s`;
  const whole = Math.round(timeS);
  const mm = String(Math.floor((whole % 3600) / 60)).padStart(2, '0');
  const ss = String(whole % 60).padStart(2, '0');
  return `${Math.floor(whole / 3600)}\u00a0h ${mm}\u00a0min ${ss}\u00a0s`;
}
