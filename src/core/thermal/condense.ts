import type { AssembledNetwork } from './assemble';
import { solveSpd } from './dense';

/**
 * Static condensation of massless nodes (C = 0): with d the nodes with capacity and s the
 * others, 0 = −G_sd T_d − G_ss T_s + B_s u gives T_s = M T_d + E u, and the reduced system
 * C_d dT_d/dt = −G_r T_d + B_r u with G_r = G_dd + G_ds M, B_r = B_d − G_ds E.
 */
export type CondensedNetwork = {
  dynamic: Int32Array;
  massless: Int32Array;
  capacity: Float64Array;
  conductance: Float64Array;
  input: Float64Array;
  masslessFromDynamic: Float64Array;
  masslessFromInputs: Float64Array;
};

export function condenseNetwork(net: AssembledNetwork): CondensedNetwork {
  const { nodeCount: N, inputCount: q, capacity, conductance: G, input: B } = net;
  const dyn: number[] = [];
  const mass: number[] = [];
  for (let i = 0; i < N; i++) (capacity[i] > 0 ? dyn : mass).push(i);
  const n = dyn.length;
  const s = mass.length;
  const gss = new Float64Array(s * s);
  const rhs = new Float64Array(s * (n + q));
  for (let a = 0; a < s; a++) {
    for (let b = 0; b < s; b++) gss[a * s + b] = G[mass[a] * N + mass[b]];
    for (let p = 0; p < n; p++) rhs[a * (n + q) + p] = -G[mass[a] * N + dyn[p]];
    for (let k = 0; k < q; k++) rhs[a * (n + q) + n + k] = B[mass[a] * q + k];
  }
  const sol = solveSpd(gss, s, rhs, n + q, 'massless nodes');
  const M = new Float64Array(s * n);
  const E = new Float64Array(s * q);
  for (let a = 0; a < s; a++) {
    for (let p = 0; p < n; p++) M[a * n + p] = sol[a * (n + q) + p];
    for (let k = 0; k < q; k++) E[a * q + k] = sol[a * (n + q) + n + k];
  }
  const gr = new Float64Array(n * n);
  const br = new Float64Array(n * q);
  for (let p = 0; p < n; p++) {
    for (let r = 0; r < n; r++) {
      let v = G[dyn[p] * N + dyn[r]];
      for (let a = 0; a < s; a++) v += G[dyn[p] * N + mass[a]] * M[a * n + r];
      gr[p * n + r] = v;
    }
    for (let k = 0; k < q; k++) {
      let v = B[dyn[p] * q + k];
      for (let a = 0; a < s; a++) v -= G[dyn[p] * N + mass[a]] * E[a * q + k];
      br[p * q + k] = v;
    }
  }
  // Symmetric in exact arithmetic; enforce it so the eigen solver may assume it.
  for (let p = 0; p < n; p++) {
    for (let r = p + 1; r < n; r++) {
      const v = 0.5 * (gr[p * n + r] + gr[r * n + p]);
      gr[p * n + r] = v;
      gr[r * n + p] = v;
    }
  }
  return {
    dynamic: Int32Array.from(dyn),
    massless: Int32Array.from(mass),
    capacity: Float64Array.from(dyn, (i) => capacity[i]),
    conductance: gr,
    input: br,
    masslessFromDynamic: M,
    masslessFromInputs: E,
  };
}
