import { MAX_LISTED_EVENTS } from './constants';

/** Something that changed the operating state during the run. Times in s from the start. */
export type StudyEvent =
  | { kind: 'shutdown'; timeS: number; device: string; junctionC: number }
  | { kind: 'resume'; timeS: number; device: string; junctionC: number }
  | {
      kind: 'dropout';
      timeS: number;
      endS: number;
      devices: string[];
      vinV: number;
      requestedVoutV: number;
      voutV: number;
      dropoutV: number;
    }
  | {
      kind: 'tap-change';
      timeS: number;
      /** Taps by index into railPlan.taps (lowest voltage first) and by name. */
      from: number;
      to: number;
      fromName: string;
      toName: string;
      /** The sensed voltage that crossed θ ± h/2 (output reached on the old tap, or the set point), V. */
      sensedV: number;
    }
  | {
      kind: 'current-limit';
      timeS: number;
      endS: number;
      devices: string[];
      requestedA: number;
      deliveredA: number;
      differentialV: number;
    };

export type EventKind = StudyEvent['kind'];

export type EventLog = {
  add(event: Instant): void;
  /** Adds a state that lasts from timeS to endS, joined to the last one of its kind when it continues it unchanged. */
  addSpan(event: Span): void;
  listed: StudyEvent[];
  counts: Record<EventKind, number>;
  /** Thermal-shutdown trips per device id, listed or not. */
  trips: Map<string, number>;
};

type Span = Extract<StudyEvent, { endS: number }>;
type Instant = Exclude<StudyEvent, Span>;

const sameDevices = (a: string[], b: string[]) => a.length === b.length && a.every((id, i) => id === b[i]);

/** True when b starts where a ends with the same values (consecutive pieces of one state). */
function continues(a: Span, b: Span): boolean {
  if (a.endS !== b.timeS || !sameDevices(a.devices, b.devices)) return false;
  if (a.kind === 'dropout' && b.kind === 'dropout') {
    return a.vinV === b.vinV && a.requestedVoutV === b.requestedVoutV && a.voutV === b.voutV && a.dropoutV === b.dropoutV;
  }
  if (a.kind === 'current-limit' && b.kind === 'current-limit') {
    return a.requestedA === b.requestedA && a.deliveredA === b.deliveredA && a.differentialV === b.differentialV;
  }
  return false;
}

/** Events in time order; after MAX_LISTED_EVENTS only their counts grow. */
export function createEventLog(limit = MAX_LISTED_EVENTS): EventLog {
  const listed: StudyEvent[] = [];
  const counts: Record<EventKind, number> = { shutdown: 0, resume: 0, dropout: 0, 'current-limit': 0, 'tap-change': 0 };
  const open: Partial<Record<EventKind, Span>> = {};
  const trips = new Map<string, number>();
  return {
    listed,
    counts,
    trips,
    add(event) {
      counts[event.kind]++;
      if (event.kind === 'shutdown') trips.set(event.device, (trips.get(event.device) ?? 0) + 1);
      if (listed.length < limit) listed.push(event);
    },
    addSpan(event) {
      const previous = open[event.kind];
      if (previous && continues(previous, event)) {
        previous.endS = event.endS;
        return;
      }
      counts[event.kind]++;
      if (listed.length < limit) {
        const copy = { ...event };
        listed.push(copy);
        open[event.kind] = copy;
      } else {
        open[event.kind] = { ...event };
      }
    },
  };
}
