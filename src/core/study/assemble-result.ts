import type { StudyModel } from './study-model';
import type { Observer } from './observer';
import type { EventLog } from './event-log';
import type { PassesRun } from './run-passes';
import type { DeviceResult, SinkResult, StudyResult } from './result-types';
import { MAX_LISTED_EVENTS } from './constants';
import type { SoaTracker } from './soa-tracker';
import type { RailSelection } from './rail-selection';
import type { DeviceSoaResult } from './soa-result-types';
import { deviceSoaResult } from './soa-result';
import { railPlanResult } from './rail-result';
import { adjustableResult } from './adjustable-result';
import type { SiteResult } from './reliability-result-types';
import type { JunctionHistory } from './junction-history';
import { lifetimeResult } from './lifetime-result';
import { touchResult } from './touch-result';

export type AssembleInput = {
  sm: StudyModel;
  observer: Observer;
  events: EventLog;
  run: PassesRun;
  method: StudyResult['solver']['method'];
  stretches: number;
  periodic?: StudyResult['solver']['periodic'];
  warnings: string[];
  rsaRange?: [number, number][];
  soa?: SoaTracker | null;
  rail?: RailSelection | null;
  site?: SiteResult;
  history?: JunctionHistory | null;
};

/** SOA results by device id, with a warning line for each failure and each SOA warning. */
function soaResults(input: AssembleInput): Record<string, DeviceSoaResult> {
  const out: Record<string, DeviceSoaResult> = {};
  const tracker = input.soa;
  if (!tracker) return out;
  tracker.devices.forEach((d, k) => {
    const r = deviceSoaResult(input.sm.doc.devices[d], d, tracker.accumulators[k]);
    out[r.device] = r;
    const w = r.worst;
    if (!r.passed && w) {
      input.warnings.push(`${r.device} leaves its safe operating area: margin ${w.margin.toPrecision(3)} at ${w.timeS} s (${w.vceV.toPrecision(3)} V, ${w.icA.toPrecision(3)} A, ${w.limit} limit).`);
    }
    for (const x of r.warnings) input.warnings.push(`${r.device}: ${x.message} (${x.stretches} stretch${x.stretches === 1 ? '' : 'es'}, the first at ${x.firstTimeS} s)`);
  });
  return out;
}

/** Whether every number in the value is finite: the walk of assertFinite without a path string per field. */
function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (!value || typeof value !== 'object' || ArrayBuffer.isView(value)) return true;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) if (!allFinite(value[i])) return false;
    return true;
  }
  for (const k in value) if (Object.prototype.hasOwnProperty.call(value, k) && !allFinite((value as Record<string, unknown>)[k])) return false;
  return true;
}

/** Throws, naming the field, where a number is not finite (the path is built only then). */
function assertFinite(value: unknown, path: string): void {
  if (!allFinite(value)) findNonFinite(value, path);
}

function findNonFinite(value: unknown, path: string): void {
  if (typeof value === 'number' && !Number.isFinite(value)) {
    throw new RangeError(`${path}: the solution is not a finite number; check the study's values for extremes`);
  }
  if (Array.isArray(value)) value.forEach((v, i) => findNonFinite(v, `${path}[${i}]`));
  else if (value && typeof value === 'object' && !ArrayBuffer.isView(value)) {
    for (const [k, v] of Object.entries(value)) findNonFinite(v, `${path}.${k}`);
  }
}

/** Turns what the observer gathered into the study result; never lets a NaN through. */
export function assembleResult(input: AssembleInput): StudyResult {
  const { sm, observer: obs, events, run } = input;
  const { doc } = sm;
  const duration = run.endS;
  const devices: Record<string, DeviceResult> = {};
  doc.devices.forEach((d, i) => {
    const targetC = obs.targetC[i];
    const peak = obs.peakC[2 * i];
    const result: DeviceResult = {
      id: d.id,
      ...(d.name !== undefined ? { name: d.name } : {}),
      count: d.count,
      sink: d.sink,
      peakJunctionC: peak,
      peakTimeS: obs.peakTimeS[2 * i],
      peakCaseC: obs.peakC[2 * i + 1],
      peakCaseTimeS: obs.peakTimeS[2 * i + 1],
      tjMaxC: d.tjMaxC,
      targetC,
      marginToMaxK: d.tjMaxC - peak,
      marginToTargetK: targetC - peak,
      timeAboveTargetS: Math.min(duration, obs.timeAboveS[i]),
      peakPowerW: obs.peakPartPowerW[i],
      averagePowerW: duration > 0 ? obs.partEnergyJ[i] / duration : 0,
      energyJ: obs.partEnergyJ[i],
      shutdowns: events.trips.get(d.id) ?? 0,
    };
    if (d.kind) result.kind = d.kind;
    const adjustable = adjustableResult(doc, i);
    if (adjustable) result.adjustable = adjustable;
    devices[d.id] = result;
  });
  const eventTotal = Object.values(events.counts).reduce((a, b) => a + b, 0);
  if (eventTotal > events.listed.length) {
    input.warnings.push(`${eventTotal} events: the list holds the first ${MAX_LISTED_EVENTS}; eventCounts counts them all.`);
  }
  const firstSink = 2 * doc.devices.length;
  const sinks: Record<string, SinkResult> = {};
  doc.sinks.forEach((s, i) => {
    const result: SinkResult = {
      id: s.id,
      ...(s.name !== undefined ? { name: s.name } : {}),
      peakC: obs.peakC[firstSink + i],
      peakTimeS: obs.peakTimeS[firstSink + i],
      rthKPerW: s.rthKPerW,
    };
    const range = input.rsaRange?.[i];
    if (s.naturalConvection && range && Number.isFinite(range[0])) result.rthRangeKPerW = range;
    sinks[s.id] = result;
  });
  const worstDevice = Object.values(devices).reduce((a, b) => (b.marginToTargetK < a.marginToTargetK ? b : a));
  const soa = soaResults(input);
  const railPlan = input.rail ? railPlanResult(doc, input.rail, events.counts['tap-change']) : undefined;
  if (railPlan) input.warnings.push(...railPlan.warnings);
  const result: StudyResult = {
    title: doc.title,
    durationS: duration,
    marginK: doc.marginK,
    ambient: { minC: run.ambientMinC, maxC: run.ambientMaxC },
    devices,
    sinks,
    worst: { device: worstDevice.id, peakJunctionC: worstDevice.peakJunctionC, marginToTargetK: worstDevice.marginToTargetK, timeS: worstDevice.peakTimeS },
    meetsTarget: Object.values(devices).every((d) => d.marginToTargetK > 0),
    soa,
    soaPasses: Object.values(soa).every((r) => r.passed),
    events: events.listed,
    eventCounts: { ...events.counts },
    solver: {
      method: input.method,
      stretches: input.stretches,
      compiledModels: sm.compiledCount(),
      convectionTolerance: sm.tolerance,
    },
    warnings: input.warnings,
  };
  if (sm.enclosure >= 0) {
    const w = obs.nodes.length - 1;
    result.enclosure = { peakC: obs.peakC[w], peakTimeS: obs.peakTimeS[w] };
  }
  if (input.periodic) result.solver.periodic = input.periodic;
  if (railPlan) result.railPlan = railPlan;
  if (input.site) result.site = input.site;
  const lifetime = input.history ? lifetimeResult(doc, input.history, doc.profile.periodic) : undefined;
  if (lifetime) result.lifetime = lifetime;
  const touch = touchResult(doc, sinks);
  if (touch) result.touch = touch;
  assertFinite(result, 'result');
  if (obs.series) result.series = obs.series.build();
  if (obs.rows) {
    const peakRows = obs.peakRows.flatMap((row, w) => (row ? [{ node: obs.keys[w], row }] : []));
    result.table = { ...obs.rows.table(), peakRows };
  }
  return result;
}
