import { EigenvalueDecomposition } from 'ml-matrix';
import { assembleNetwork } from './assemble';
import { condenseNetwork } from './condense';
import { STIFFNESS_LIMIT } from './constants';
import { solveSpd, toMatrix } from './dense';
import { createExpSumWorkspace } from './exp-sum-roots';
import type { ModalModel, NetworkSpec } from './types';
import { validateNetwork } from './validate-network';

/**
 * Compiles a network into modal form (PHYSICS.md §3): assembles C, G, B, condenses massless
 * nodes, and diagonalises the symmetric S = C^(−1/2) G C^(−1/2) = Q Λ Qᵀ, so that with
 * x = Qᵀ C^(1/2) T every mode obeys dx_k/dt = −λ_k (x_k − x∞_k). Everything a segment needs
 * is precomputed (see ModalModel). Throws TypeError / RangeError naming the field for bad
 * input (see validateNetwork), and RangeError naming the fastest node when λmax/λmin
 * exceeds STIFFNESS_LIMIT (the slowest mode could not be resolved; make that node massless).
 */
export function compileNetwork(spec: NetworkSpec): ModalModel {
  validateNetwork(spec);
  const net = assembleNetwork(spec);
  const red = condenseNetwork(net);
  const N = net.nodeCount;
  const q = net.inputCount;
  const n = red.dynamic.length;

  const rates = new Float64Array(n);
  const Q = new Float64Array(n * n); // Q[p, k]: component of mode k on dynamic node p
  if (n > 0) {
    const invSqrtC = Float64Array.from(red.capacity, (c) => 1 / Math.sqrt(c));
    // QL iteration keeps graded matrices to full relative accuracy when the large entries
    // sit bottom-right (measured: 1e−15 instead of 1e−5 on the slowest mode at λmax/λmin
    // = 1e12), so diagonalise with the nodes in ascending order of G_pp / C_p.
    const perm = Array.from({ length: n }, (_, p) => p);
    perm.sort((i, j) => red.conductance[i * n + i] / red.capacity[i] - red.conductance[j * n + j] / red.capacity[j]);
    const S = new Float64Array(n * n);
    for (let a = 0; a < n; a++) {
      for (let b = 0; b < n; b++) {
        const p = perm[a];
        const r = perm[b];
        S[a * n + b] = red.conductance[p * n + r] * invSqrtC[p] * invSqrtC[r];
      }
    }
    const evd = new EigenvalueDecomposition(toMatrix(S, n, n), { assumeSymmetric: true });
    const values = evd.realEigenvalues;
    const order = values.map((_, k) => k).sort((i, j) => values[i] - values[j]);
    const vectors = evd.eigenvectorMatrix;
    order.forEach((k, col) => {
      rates[col] = values[k];
      for (let a = 0; a < n; a++) Q[perm[a] * n + col] = vectors.get(a, k);
    });
    checkStiffness(spec, red.dynamic, red.capacity, red.conductance, rates);
  }

  const W = new Float64Array(N * n);
  const D = new Float64Array(N * q);
  const F = new Float64Array(n * q);
  const P = new Float64Array(n * N);
  for (let p = 0; p < n; p++) {
    const i = red.dynamic[p];
    const c = red.capacity[p];
    const sc = Math.sqrt(c);
    for (let k = 0; k < n; k++) {
      W[i * n + k] = Q[p * n + k] / sc;
      P[k * N + i] = Q[p * n + k] * sc;
    }
  }
  for (let a = 0; a < red.massless.length; a++) {
    const i = red.massless[a];
    for (let k = 0; k < n; k++) {
      let v = 0;
      for (let p = 0; p < n; p++) v += red.masslessFromDynamic[a * n + p] * W[red.dynamic[p] * n + k];
      W[i * n + k] = v;
    }
    for (let j = 0; j < q; j++) D[i * q + j] = red.masslessFromInputs[a * q + j];
  }
  for (let k = 0; k < n; k++) {
    for (let j = 0; j < q; j++) {
      let v = 0;
      for (let p = 0; p < n; p++) v += (Q[p * n + k] / Math.sqrt(red.capacity[p])) * red.input[p * q + j];
      F[k * q + j] = v / rates[k];
    }
  }
  // Steady state from the full system: exact Ohm's-law answer, free of eigen round-off.
  const K = solveSpd(net.conductance, N, net.input, q, 'network');

  return {
    nodeIds: spec.nodes.map((node) => node.id),
    nodeIndex: net.nodeIndex,
    nodeCount: N,
    powerInputCount: q - 1,
    inputCount: q,
    modeCount: n,
    massless: Uint8Array.from({ length: N }, (_, i) => (spec.nodes[i].capacityJPerK > 0 ? 0 : 1)),
    rates,
    outputFromModes: W,
    outputFromInputs: D,
    modesFromInputs: F,
    modesFromTemperatures: P,
    steadyFromInputs: K,
    stiffness: n > 1 ? rates[n - 1] / rates[0] : 1,
    scratch: {
      x: new Float64Array(n),
      xInf: new Float64Array(n),
      decay: new Float64Array(n),
      sum: createExpSumWorkspace(n + 1),
    },
  };
}

function checkStiffness(
  spec: NetworkSpec,
  dynamic: Int32Array,
  capacity: Float64Array,
  conductance: Float64Array,
  rates: Float64Array,
): void {
  const n = rates.length;
  const ratio = rates[n - 1] / rates[0];
  if (rates[0] > 0 && ratio <= STIFFNESS_LIMIT) return;
  // The node with the shortest own time constant C/G_ii causes the stiffness.
  let fastest = 0;
  for (let p = 1; p < n; p++) {
    if (capacity[p] / conductance[p * n + p] < capacity[fastest] / conductance[fastest * n + fastest]) fastest = p;
  }
  const i = dynamic[fastest];
  throw new RangeError(
    `nodes[${i}].capacityJPerK: time constants span more than ${STIFFNESS_LIMIT.toExponential(0)} ` +
      `(node "${spec.nodes[i].id}" is far faster than the rest); make it massless (0)`,
  );
}
