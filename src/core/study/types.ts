import type { CauerStage, FosterTerm } from '../thermal';
import type { CurvePoint } from '../electrical';

/**
 * The study document, format "junctura-study" version 1, as returned by `parseStudy`:
 * every default filled in, every reference checked. Units: s, W, V, A, K/W, J/K, kg; °C for
 * temperatures. docs/study-format.md describes each field.
 */

export const STUDY_FORMAT = 'junctura-study';
export const STUDY_VERSION = 1;

export type { CauerStage, FosterTerm, CurvePoint };

export type PackageModel =
  | { kind: 'foster'; terms: FosterTerm[] }
  | { kind: 'cauer'; stages: CauerStage[] }
  | { kind: 'lumped'; rthKPerW: number; capacityJPerK: number };

export type ThermalShutdown = { tripC: number; hysteresisK: number };

export type ElectricalModel = {
  role: 'pass' | 'other';
  iqA: number;
  /** Dropout voltage against the current in one part: `x` A, `y` V. */
  dropout?: CurvePoint[];
  /** Current limit of one part against its differential Vin − Vout: `x` V, `y` A. */
  currentLimit?: CurvePoint[];
  thermalShutdown?: ThermalShutdown;
};

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

/** One constant-input stretch of the load profile after groups are expanded. */
export type ProfileSegment = {
  durationS: number;
  /** Watts in each part of the named device entries. */
  powerW: Record<string, number>;
  electrical?: ElectricalDrive;
  label?: string;
};

export type Profile = {
  segments: ProfileSegment[];
  repeat: number;
  periodic: boolean;
};

export type StudyDocument = {
  format: typeof STUDY_FORMAT;
  version: typeof STUDY_VERSION;
  title: string;
  description: string;
  marginK: number;
  ambient: Ambient;
  enclosure?: Enclosure;
  sinks: Sink[];
  devices: Device[];
  profile: Profile;
};
