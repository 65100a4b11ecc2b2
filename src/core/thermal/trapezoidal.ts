import { LuDecomposition } from 'ml-matrix';
import { assembleNetwork } from './assemble';
import { checkIndex, checkNumber, checkVector } from './check-input';
import { checkProfile } from './check-profile';
import { condenseNetwork, type CondensedNetwork } from './condense';
import { toMatrix } from './dense';
import type { NetworkSpec, Peak, Profile, RunOptions, RunResult } from './types';
import { validateNetwork } from './validate-network';

export type TrapezoidalOptions = Omit<RunOptions, 'periodic'> & {
  /** Largest step, s; each segment takes ceil(h / dtS) equal steps, so boundaries are hit. */
  dtS: number;
};

export type TrapezoidalResult = RunResult & {
  /** Steps taken in all. */
  stepCount: number;
  /** LU factorisations made (one per distinct step size, at most FACTOR_CACHE_SIZE kept). */
  factorisations: number;
};

/** Distinct step sizes whose factors are kept; profiles of many lengths refactor. */
const FACTOR_CACHE_SIZE = 64;

/** LU factors of (C/dt + G/2) and the explicit half (C/dt − G/2), for one step size. */
type StepFactor = { lu: Float64Array; pivot: Int32Array; explicit: Float64Array };

/**
 * Trapezoidal (Crank–Nicolson) integration of the same network, a cross-check of the modal
 * solver only: (C/dt + G/2) T⁺ = (C/dt − G/2) T + B u on the condensed system, second-order
 * accurate; peaks are sampled at the steps. Same profile format and result as runProfile.
 */
export function simulateTrapezoidal(spec: NetworkSpec, profile: Profile, options: TrapezoidalOptions): TrapezoidalResult {
  validateNetwork(spec);
  const dtMax = checkNumber(options?.dtS, 'options.dtS', 0, true);
  const net = assembleNetwork(spec);
  const red = condenseNetwork(net);
  const N = net.nodeCount;
  const q = net.inputCount;
  const n = red.dynamic.length;
  const { durations, inputs } = checkProfile(profile, q);
  const watch = (options.watchNodes ?? []).map((j, w) => checkIndex(j, `options.watchNodes[${w}]`, N));

  const T = new Float64Array(N);
  const u = Float64Array.from({ length: q }, (_, j) => inputs[j]);
  if (options.initial !== undefined) {
    checkVector(options.initial, 'options.initial', N);
    for (let i = 0; i < N; i++) T[i] = options.initial[i];
  } else {
    T.fill(u[q - 1]);
  }
  const Td = Float64Array.from(red.dynamic, (i) => T[i]);
  fillMassless(red, Td, u, T);
  const initial = T.slice();
  const S = durations.length;
  const boundaries = options.recordBoundaries ? new Float64Array((S + 1) * N) : undefined;
  const boundaryTimes = options.recordBoundaries ? new Float64Array(S + 1) : undefined;
  boundaries?.set(T, 0);

  const factors = new Map<number, StepFactor>();
  let factorisations = 0;
  let stepCount = 0;
  const rhs = new Float64Array(n);
  const peakValue = Float64Array.from(watch, (j) => T[j]);
  const watchAt = Int32Array.from(watch, (j) => {
    const p = red.dynamic.indexOf(j);
    return p >= 0 ? p : -red.massless.indexOf(j) - 1;
  });
  const peakTime = new Float64Array(watch.length);
  let t = 0;
  for (let s = 0; s < S; s++) {
    const h = durations[s];
    for (let j = 0; j < q; j++) u[j] = inputs[s * q + j];
    if (h > 0) {
      sample(watchAt, red, Td, u, peakValue, peakTime, t);
      const steps = Math.ceil(h / dtMax);
      const dt = h / steps;
      let f = factors.get(dt);
      if (!f) {
        if (factors.size >= FACTOR_CACHE_SIZE) factors.clear();
        f = factorStep(red, dt);
        factors.set(dt, f);
        factorisations++;
      }
      for (let k = 0; k < steps; k++) {
        step(f, red, Td, u, rhs, n, q);
        sample(watchAt, red, Td, u, peakValue, peakTime, t + (k + 1) * dt);
      }
      stepCount += steps;
      t += h;
    }
    if (boundaries && boundaryTimes) {
      fillMassless(red, Td, u, T);
      boundaries.set(T, (s + 1) * N);
      boundaryTimes[s + 1] = t;
    }
  }
  fillMassless(red, Td, u, T);
  const peaks: Peak[] = watch.map((_, w) => ({ valueC: peakValue[w], timeS: peakTime[w] }));
  return {
    peaks,
    final: T.slice(),
    initial,
    stepCount,
    factorisations,
    ...(boundaries ? { boundaries, boundaryTimes } : {}),
  };
}

/** Records new peaks of the watched nodes: p ≥ 0 is a dynamic node, p < 0 massless −p − 1. */
function sample(
  watchAt: Int32Array,
  red: CondensedNetwork,
  Td: Float64Array,
  u: Float64Array,
  peakValue: Float64Array,
  peakTime: Float64Array,
  t: number,
): void {
  const n = Td.length;
  const q = u.length;
  for (let w = 0; w < watchAt.length; w++) {
    const p = watchAt[w];
    let v: number;
    if (p >= 0) {
      v = Td[p];
    } else {
      const a = -p - 1;
      v = 0;
      for (let r = 0; r < n; r++) v += red.masslessFromDynamic[a * n + r] * Td[r];
      for (let j = 0; j < q; j++) v += red.masslessFromInputs[a * q + j] * u[j];
    }
    if (v > peakValue[w]) {
      peakValue[w] = v;
      peakTime[w] = t;
    }
  }
}

function factorStep(red: CondensedNetwork, dt: number): StepFactor {
  const n = red.dynamic.length;
  const implicit = new Float64Array(n * n);
  const explicit = new Float64Array(n * n);
  for (let p = 0; p < n; p++) {
    for (let r = 0; r < n; r++) {
      const half = 0.5 * red.conductance[p * n + r];
      const c = p === r ? red.capacity[p] / dt : 0;
      implicit[p * n + r] = c + half;
      explicit[p * n + r] = c - half;
    }
  }
  const lu = new Float64Array(n * n);
  const pivot = new Int32Array(n);
  if (n > 0) {
    const d = new LuDecomposition(toMatrix(implicit, n, n));
    if (d.isSingular()) throw new RangeError('options.dtS: the step matrix is singular');
    const L = d.lowerTriangularMatrix;
    const U = d.upperTriangularMatrix;
    for (let p = 0; p < n; p++) {
      for (let r = 0; r < n; r++) lu[p * n + r] = r < p ? L.get(p, r) : U.get(p, r);
    }
    d.pivotPermutationVector.forEach((v, i) => (pivot[i] = v));
  }
  return { lu, pivot, explicit };
}

/** One step: rhs = (C/dt − G/2) T + B u, then forward and back substitution with the LU. */
function step(f: StepFactor, red: CondensedNetwork, Td: Float64Array, u: Float64Array, rhs: Float64Array, n: number, q: number): void {
  const { lu, pivot, explicit } = f;
  for (let p = 0; p < n; p++) {
    let v = 0;
    for (let r = 0; r < n; r++) v += explicit[p * n + r] * Td[r];
    for (let j = 0; j < q; j++) v += red.input[p * q + j] * u[j];
    rhs[p] = v;
  }
  for (let p = 0; p < n; p++) {
    let v = rhs[pivot[p]];
    for (let r = 0; r < p; r++) v -= lu[p * n + r] * Td[r];
    Td[p] = v;
  }
  for (let p = n - 1; p >= 0; p--) {
    let v = Td[p];
    for (let r = p + 1; r < n; r++) v -= lu[p * n + r] * Td[r];
    Td[p] = v / lu[p * n + p];
  }
}

/** Scatter the dynamic temperatures into T and reconstruct massless nodes for inputs u. */
function fillMassless(red: CondensedNetwork, Td: Float64Array, u: Float64Array, T: Float64Array): void {
  const n = red.dynamic.length;
  const q = u.length;
  for (let p = 0; p < n; p++) T[red.dynamic[p]] = Td[p];
  for (let a = 0; a < red.massless.length; a++) {
    let v = 0;
    for (let p = 0; p < n; p++) v += red.masslessFromDynamic[a * n + p] * Td[p];
    for (let j = 0; j < q; j++) v += red.masslessFromInputs[a * q + j] * u[j];
    T[red.massless[a]] = v;
  }
}
