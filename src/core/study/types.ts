import type { CauerStage, FosterTerm } from '../thermal';
import type { CurvePoint } from '../electrical';
import type { SoaModel } from '../soa';
import type { OutputRange, RailPlan, Relay } from '../rails';
import type { StudyLifetime, StudySite, StudyTouch } from './reliability-types';

/**
 * The study document, format "junctura-study" version 1, as returned by `parseStudy`:
 * every default filled in, every reference checked. Units: s, W, V, A, K/W, J/K, kg; °C for
 * temperatures. docs/study-format.md describes each field.
 */

export const STUDY_FORMAT = 'junctura-study';
export const STUDY_VERSION = 1;

export type { CauerStage, FosterTerm, CurvePoint, SoaModel };

export type PackageModel =
  | { kind: 'foster'; terms: FosterTerm[] }
  | { kind: 'cauer'; stages: CauerStage[] }
  | { kind: 'lumped'; rthKPerW: number; capacityJPerK: number };

export type ThermalShutdown = { tripC: number; hysteresisK: number };

/** Divider of an adjustable regulator: Vout = Vref (1 + R2/R1) + Iadj·R2 (PHYSICS.md §1). */
export type AdjustableDivider = { vrefV: number; r1Ohm: number; r2Ohm: number; iadjA: number };

export type ElectricalModel = {
  role: 'pass' | 'other';
  iqA: number;
  /** Dropout voltage against the current in one part: `x` A, `y` V. */
  dropout?: CurvePoint[];
  /** Current limit of one part against its differential Vin − Vout: `x` V, `y` A. */
  currentLimit?: CurvePoint[];
  thermalShutdown?: ThermalShutdown;
  /** Set point from a divider; segments feeding this device may then leave out voutV. */
  adjustable?: AdjustableDivider;
};

/** What a device is; informational, except that an integrated regulator has no SOA model. */
export type DeviceKind = 'regulator' | 'bipolar' | 'darlington' | 'mosfet';
export const DEVICE_KINDS: readonly DeviceKind[] = ['regulator', 'bipolar', 'darlington', 'mosfet'];

export type Device = {
  id: string;
  name?: string;
  tjMaxC: number;
  sink: string;
  /** Identical parts in parallel, sharing the current equally. */
  count: number;
  package: PackageModel;
  interfaceRthKPerW: number;
  electrical?: ElectricalModel;
  kind?: DeviceKind;
  /** The team library part it was taken from (informational). */
  partId?: number;
  /** Safe operating area of one part, checked at every operating point of the solved profile. */
  soa?: SoaModel;
  /**
   * Not a document field: current of each part as a fraction of the equal share when fed by
   * an electrical segment (default 1). Set by the tolerance sweep for part-to-part share error.
   */
  currentShare?: number;
};

export type NaturalConvection = { referenceRiseK: number; exponent: number };
export type ForcedAir = { airSpeedMPerS: number; points: { airSpeedMPerS: number; rthKPerW: number }[] };

export type Sink = {
  id: string;
  name?: string;
  /** Rθsa at the reference condition (natural convection) or at the stated air speed. */
  rthKPerW: number;
  capacityJPerK: number;
  /** Where the Rθsa leads: another sink's id, "enclosure" or "ambient". */
  to: string;
  naturalConvection?: NaturalConvection;
  forcedAir?: ForcedAir;
};

export type Enclosure = { rthKPerW: number; capacityJPerK: number };

export type AmbientPoint = { timeS: number; temperatureC: number };
export type Ambient =
  | { kind: 'constant'; temperatureC: number }
  | { kind: 'profile'; interpolation: 'step' | 'linear'; points: AmbientPoint[] };

export type ElectricalDrive = { vinV: number; voutV: number; iloadA: number; devices?: string[] };

/** An operating point whose input voltage comes from the tap the rail plan selects. */
export type RailDrive = { voutV: number; iloadA: number; devices?: string[] };

/** One constant-input stretch of the load profile after groups are expanded. */
export type ProfileSegment = {
  durationS: number;
  /** Watts in each part of the named device entries. */
  powerW: Record<string, number>;
  electrical?: ElectricalDrive;
  /** Only in a study with a rail plan (instead of `electrical`). */
  railDrive?: RailDrive;
  label?: string;
};

export type Profile = {
  segments: ProfileSegment[];
  repeat: number;
  periodic: boolean;
};

/**
 * The rail plan of a study (src/core/rails types): sources, taps, thresholds with hysteresis
 * on the sensed voltage; the device entry it feeds; the relay for the chatter check; the
 * Vout × Iout range and grid of the dissipation map.
 */
export type StudyRailPlan = RailPlan & {
  device: string;
  relay?: Relay;
  map: OutputRange & { voutSteps: number; ioutSteps: number };
};

export type StudyDocument = {
  format: typeof STUDY_FORMAT;
  version: typeof STUDY_VERSION;
  title: string;
  description: string;
  /** The supply is fed from the mains (shows the mains-wiring caution); absent when not stated. */
  mainsFed?: boolean;
  marginK: number;
  ambient: Ambient;
  enclosure?: Enclosure;
  sinks: Sink[];
  devices: Device[];
  profile: Profile;
  railPlan?: StudyRailPlan;
  /** Site altitude (derates convection), life from temperature cycles, touch limits. */
  site?: StudySite;
  lifetime?: StudyLifetime;
  touch?: StudyTouch;
};
