import type { EventLog } from './event-log';
import type { SegmentPower } from './segment-power';
import type { StudyDocument } from './types';

/** Logs dropout and current limit of an electrical stretch [t, t + h] (joined to the previous stretch when it continues it). */
export function logDriveEvents(doc: StudyDocument, events: EventLog, power: SegmentPower, vin: number, requestedVout: number, requestedA: number, t: number, h: number): void {
  const op = power.operatingPoint;
  if (!op || op.outputOff || h === 0 || !(op.inDropout || op.currentLimited)) return;
  const devices = power.fed.map((i) => doc.devices[i].id);
  if (op.inDropout) {
    events.addSpan({ kind: 'dropout', timeS: t, endS: t + h, devices, vinV: vin, requestedVoutV: requestedVout, voutV: op.voutV, dropoutV: op.dropoutV });
  }
  if (op.currentLimited) {
    events.addSpan({ kind: 'current-limit', timeS: t, endS: t + h, devices, requestedA, deliveredA: op.currentA, differentialV: vin - op.voutV });
  }
}
