import type { EventKind, StudyEvent } from './event-log';
import type { Series } from './series-recorder';
import type { BoundaryTable } from './boundary-table';
import type { DeviceKind } from './types';
import type { DeviceSoaResult } from './soa-result-types';
import type { RailPlanResult } from './rail-result-types';
import type { AdjustableResult } from './adjustable-result';
import type { LifetimeResult, SiteResult, TouchResult } from './reliability-result-types';

/** Node temperatures (time, the table's columns) at the peak of `node`. */
export type PeakRow = { node: string; row: Float64Array };

/** Results of one device entry (temperatures of each of its `count` identical parts). */
export type DeviceResult = {
  id: string;
  name?: string;
  count: number;
  sink: string;
  peakJunctionC: number;
  peakTimeS: number;
  peakCaseC: number;
  peakCaseTimeS: number;
  tjMaxC: number;
  /** Tj,max − the study's margin. */
  targetC: number;
  /** Tj,max − peak junction, K (negative when exceeded). */
  marginToMaxK: number;
  /** Target − peak junction, K (negative when exceeded). */
  marginToTargetK: number;
  /** Time the junction spends at or above the target, s. */
  timeAboveTargetS: number;
  /** Highest dissipation of one part, W. */
  peakPowerW: number;
  /** Mean dissipation of one part over the run, W. */
  averagePowerW: number;
  /** Heat dissipated by one part over the run, J. */
  energyJ: number;
  /** Thermal-shutdown trips. */
  shutdowns: number;
  kind?: DeviceKind;
  /** With an adjustable divider: its set point and the top of the range the inputs allow. */
  adjustable?: AdjustableResult;
};

export type SinkResult = {
  id: string;
  name?: string;
  peakC: number;
  peakTimeS: number;
  /** Rθsa as given (at the reference rise, or from the forced-air curve). */
  rthKPerW: number;
  /** Natural convection: lowest and highest Rθsa the run used. */
  rthRangeKPerW?: [number, number];
};

export type StudyResult = {
  title: string;
  /** Time covered by the results, s (one pass × repeat; periodic: from the periodic state). */
  durationS: number;
  marginK: number;
  ambient: { minC: number; maxC: number };
  devices: Record<string, DeviceResult>;
  sinks: Record<string, SinkResult>;
  enclosure?: { peakC: number; peakTimeS: number };
  /** The device with the least margin to its target, and when that happens. */
  worst: { device: string; peakJunctionC: number; marginToTargetK: number; timeS: number };
  /** True when every junction stays below its target. */
  meetsTarget: boolean;
  /** SOA check of each device with an SOA model, by device id (PHYSICS.md §4). */
  soa: Record<string, DeviceSoaResult>;
  /** True when every SOA check passes (also when no device has an SOA model). */
  soaPasses: boolean;
  /** With a rail plan: its map, worst cases, best thresholds, required Rθsa and the taps selected. */
  railPlan?: RailPlanResult;
  /** With `site`: the altitude and the factor it put on each sink's Rθsa. */
  site?: SiteResult;
  /** With `lifetime`: rainflow cycles of each junction, damage per day and life in years. */
  lifetime?: LifetimeResult;
  /** With `touch`: each sink's peak surface temperature against its touch limit. */
  touch?: TouchResult;
  /** Events in time order (at most MAX_LISTED_EVENTS), and how many of each kind happened. */
  events: StudyEvent[];
  eventCounts: Record<EventKind, number>;
  /** Chart series per node (`Q1.junction`, `Q1.case`, `S1.sink`, `enclosure.air`, `ambient`), °C. */
  series?: Record<string, Series>;
  /** With `boundaryRows`: node temperatures at every solved boundary, and a row at each peak. */
  table?: BoundaryTable & { peakRows: PeakRow[] };
  solver: {
    method: 'batch' | 'event-driven';
    /** Constant-input stretches solved in the reported run. */
    stretches: number;
    compiledModels: number;
    convectionTolerance: number;
    periodic?: { iterations: number; residualK: number; converged: boolean };
  };
  warnings: string[];
};
