import type { ExpSumWorkspace } from './exp-sum-roots';

/**
 * Shapes shared by the thermal core. Units are SI (s, W, J/K, K/W); temperatures in °C.
 * Arrays of numbers that the solver reads or writes per segment are Float64Array.
 */

/** Id reserved for the ambient boundary node (prescribed temperature, last input). */
export const AMBIENT = 'ambient';

/** A node of the network. capacityJPerK = 0 makes it massless (statically condensed). */
export type NodeSpec = { id: string; capacityJPerK: number };

/** A thermal resistance between two nodes; either end may be AMBIENT (not both). */
export type LinkSpec = { a: string; b: string; rKPerW: number };

/**
 * A thermal network. heatInputs lists the ids of the nodes that receive power, in input
 * order: the input vector is u = [P_1 … P_m, Ta] (W…, °C), so u has heatInputs.length + 1
 * entries and the ambient temperature is always the last one.
 */
export type NetworkSpec = { nodes: NodeSpec[]; links: LinkSpec[]; heatInputs: string[] };

/** A constant-input stretch of time: u = [P_1 … P_m, Ta], h in s (h ≥ 0). */
export type Segment = { u: ArrayLike<number>; h: number };

/** A temperature extreme and the time at which it first occurs. */
export type Peak = { valueC: number; timeS: number };

/** One Foster term: Zth(t) contribution rKPerW (1 − e^(−t/tauS)). */
export type FosterTerm = { rKPerW: number; tauS: number };

/** One Cauer stage, junction first: capacityJPerK at its node, rKPerW towards the next one. */
export type CauerStage = { rKPerW: number; capacityJPerK: number };

/**
 * A compiled network in modal form (see compileNetwork). All matrices are dense,
 * row-major Float64Array. With x the modal state (n entries) and u the inputs (q entries):
 *
 *   node temperatures  T = W x + D u          (N × n, N × q)
 *   modal equilibrium  x∞ = F u               (n × q)
 *   modal dynamics     dx/dt = −Λ (x − x∞)    (rates in `rates`, 1/s, ascending)
 *   modal state        x = P T                (n × N; columns of massless nodes are 0)
 *   steady state       T∞ = K u = G⁻¹ B u     (N × q)
 *
 * Treat every field as read-only; `scratch` is working storage owned by the solver.
 */
export type ModalModel = {
  /** Node ids in the order of NetworkSpec.nodes (the order of every temperature vector). */
  readonly nodeIds: readonly string[];
  /** Index of each node id. */
  readonly nodeIndex: ReadonlyMap<string, number>;
  /** N, number of nodes (ambient excluded). */
  readonly nodeCount: number;
  /** m, number of power inputs. */
  readonly powerInputCount: number;
  /** q = m + 1, length of the input vector u. */
  readonly inputCount: number;
  /** n, number of modes = number of nodes with a heat capacity. */
  readonly modeCount: number;
  /** 1 where the node is massless (its temperature follows the inputs instantly). */
  readonly massless: Uint8Array;
  /** Modal decay rates λ (1/s), ascending, all > 0. Time constants are 1/λ. */
  readonly rates: Float64Array;
  readonly outputFromModes: Float64Array;
  readonly outputFromInputs: Float64Array;
  readonly modesFromInputs: Float64Array;
  readonly modesFromTemperatures: Float64Array;
  readonly steadyFromInputs: Float64Array;
  /** λmax / λmin (1 when n ≤ 1): how stiff the network is. */
  readonly stiffness: number;
  readonly scratch: {
    readonly x: Float64Array;
    readonly xInf: Float64Array;
    readonly decay: Float64Array;
    readonly sum: ExpSumWorkspace;
  };
};

/** A long piecewise-constant profile in flat arrays (the fast path; Float64Array avoids a copy). */
export type Profile = {
  /** Segment lengths, s (each ≥ 0 and finite). */
  durations: ArrayLike<number>;
  /** Row-major segments × inputCount: row s is u for segment s. */
  inputs: ArrayLike<number>;
};

export type RunOptions = {
  /**
   * Node temperatures at t = 0, °C (length N). Default: every node at the first segment's
   * ambient. Ignored when periodic is true.
   */
  initial?: ArrayLike<number>;
  /** Indices of the nodes whose exact peak is tracked. */
  watchNodes?: readonly number[];
  /** Store every node's temperature at every segment boundary. */
  recordBoundaries?: boolean;
  /** Start from the periodic steady state of the profile repeated forever. */
  periodic?: boolean;
};

export type RunResult = {
  /** One peak per watched node, in watchNodes order; times from the profile start. */
  peaks: Peak[];
  /** Node temperatures at the end of the profile. */
  final: Float64Array;
  /** Present with recordBoundaries: (segments + 1) × N row-major, °C. */
  boundaries?: Float64Array;
  /** Present with recordBoundaries: segments + 1 times, s. */
  boundaryTimes?: Float64Array;
  /** Node temperatures at t = 0 actually used (the periodic start when periodic). */
  initial: Float64Array;
};

/** Direction of a level crossing. */
export type CrossingDirection = 'up' | 'down';
