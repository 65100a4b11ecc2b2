import type { CurvePoint } from '../electrical';

/**
 * A rail plan: sources switched into taps (series / parallel combinations) feeding one
 * linear pass element, the tap chosen by thresholds with hysteresis on a sensed voltage
 * (PHYSICS.md §2). Units: V, A, Ω, F, s, W; temperatures °C.
 */

/** A source: open-circuit voltage, output resistance, current rating. */
export type RailSource = { id: string; vocV: number; rsOhm: number; imaxA: number };

/** Parts in the path of a circuit node: a series diode (its forward drop; it blocks reverse current) and a ballast resistor. */
export type PathParts = { diodeV?: number; ballastOhm?: number };

/**
 * How a tap connects its sources. Series: voltages and resistances add, the current rating is
 * the smallest. Parallel: branches share the current through their resistances; mismatchV is
 * the worst spread of branch voltages (source tolerance, diode drops), which sets the share error.
 */
export type TapCircuit =
  | ({ kind: 'source'; source: string } & PathParts)
  | ({ kind: 'series'; parts: TapCircuit[] } & PathParts)
  | ({ kind: 'parallel'; branches: TapCircuit[]; mismatchV?: number } & PathParts);

export type Tap = { name: string; circuit: TapCircuit };

/** What the selection comparator watches: the regulated output, or the set point (always there). */
export type SensedVoltage = 'output' | 'set-point';

/** Thresholds θk between tap k and k+1 (ascending, one fewer than taps) and one hysteresis h. */
export type TapThresholds = { thresholdsV: readonly number[]; hysteresisV: number };

export type RailPlan = TapThresholds & {
  sources: RailSource[];
  /** From the lowest voltage up. */
  taps: Tap[];
  sensed: SensedVoltage;
};

/** The pass element fed by the taps: quiescent current, dropout (V, or V against A), current limit (A against Vin − Vout). */
export type PassElement = {
  iqA: number;
  dropout: number | readonly CurvePoint[];
  currentLimit?: readonly CurvePoint[];
};

/** The output range a plan must cover. */
export type OutputRange = { voutMinV: number; voutMaxV: number; ioutMaxA: number };

/** Output voltage of a tap against its current: piecewise linear, decreasing (see characteristic.ts). */
export type Characteristic = {
  i: number[];
  v: number[];
  leftSlope: number;
  rightSlope: number;
  /** A diode in the path: no reverse current, the curve starts at i = 0. */
  blocking: boolean;
};

export type TapCapability = {
  /** Largest load current with no source over its rating, A (share error included). */
  capabilityA: number;
  /** The source that reaches its rating first. */
  limitedBy: string;
  /** What the parallel mismatch costs: capability with matched branches minus capabilityA, A. */
  shareErrorA: number;
};

export type CompiledTap = TapCapability & { name: string; characteristic: Characteristic };

/** A checked plan with each tap's characteristic and capability worked out once. */
export type RailModel = { plan: RailPlan; taps: CompiledTap[] };
