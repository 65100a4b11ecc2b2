import { expm, inv, lusolve, matrix, multiply, subtract, add, type Matrix } from 'mathjs';
import { AMBIENT, advance, compileNetwork, steadyState, zth } from '@/core/thermal';
import type { NetworkSpec } from '@/core/thermal';
import { seededRandom } from '../../helpers/seeded-random';

/** A connected random network: a random tree to the ambient plus extra links. */
function randomNetwork(seed: number, masslessCount = 0): NetworkSpec {
  const rnd = seededRandom(seed);
  const logUniform = (lo: number, hi: number) => lo * (hi / lo) ** rnd();
  const N = 6 + Math.floor(rnd() * 5);
  const ids = Array.from({ length: N }, (_, i) => `n${i}`);
  const nodes = ids.map((id, i) => ({ id, capacityJPerK: i > 0 && i <= masslessCount ? 0 : logUniform(0.05, 200) }));
  const links = ids.map((id, i) => ({ a: id, b: i === 0 ? AMBIENT : ids[Math.floor(rnd() * i)], rKPerW: logUniform(0.05, 5) }));
  for (let e = 0; e < N; e++) {
    const a = Math.floor(rnd() * N);
    const b = Math.floor(rnd() * N);
    if (a !== b) links.push({ a: ids[a], b: ids[b], rKPerW: logUniform(0.05, 5) });
  }
  links.push({ a: AMBIENT, b: ids[N - 1], rKPerW: logUniform(0.5, 5) });
  return { nodes, links, heatInputs: [ids[N - 1], ids[Math.floor(rnd() * N)]] };
}

/** C, G, B assembled independently of the solver, as mathjs matrices / arrays. */
function reference(spec: NetworkSpec) {
  const N = spec.nodes.length;
  const q = spec.heatInputs.length + 1;
  const index = new Map(spec.nodes.map((n, i) => [n.id, i]));
  const G = Array.from({ length: N }, () => new Array<number>(N).fill(0));
  const B = Array.from({ length: N }, () => new Array<number>(q).fill(0));
  for (const l of spec.links) {
    const g = 1 / l.rKPerW;
    const a = index.get(l.a);
    const b = index.get(l.b);
    if (a !== undefined) G[a][a] += g;
    if (b !== undefined) G[b][b] += g;
    if (a !== undefined && b !== undefined) {
      G[a][b] -= g;
      G[b][a] -= g;
    } else {
      B[(a ?? b) as number][q - 1] += g;
    }
  }
  spec.heatInputs.forEach((id, k) => (B[index.get(id) as number][k] += 1));
  return { N, q, G, B, C: spec.nodes.map((n) => n.capacityJPerK) };
}

const toArray = (m: Matrix | number[][]) => ((m as Matrix).toArray ? ((m as Matrix).toArray() as number[][]) : (m as number[][]));

/**
 * e^(A h) by mathjs expm of A h / 2^k, then k squarings: mathjs's own parameter search gives
 * up when ‖A h‖ is large (stiff networks over long segments).
 */
function expmScaled(A: Matrix, h: number): Matrix {
  const norm = Math.max(...toArray(A).map((row) => row.reduce((s, v) => s + Math.abs(v), 0))) * h;
  const k = Math.max(0, Math.ceil(Math.log2(norm)));
  let E = expm(multiply(A, h / 2 ** k) as Matrix);
  for (let i = 0; i < k; i++) E = multiply(E, E) as Matrix;
  return E;
}

/** T(h) = T∞ + e^(A h)(T0 − T∞) on the nodes with capacity, massless ones condensed (Schur complement). */
function expmReference(spec: NetworkSpec, T0: number[], u: number[], h: number): number[] {
  const { N, G, B, C } = reference(spec);
  const d = C.map((c, i) => (c > 0 ? i : -1)).filter((i) => i >= 0);
  const s = C.map((c, i) => (c > 0 ? -1 : i)).filter((i) => i >= 0);
  const pick = (M: number[][], rows: number[], cols: number[]) => rows.map((r) => cols.map((c) => M[r][c]));
  const Bu = B.map((row) => [row.reduce((acc, b, j) => acc + b * u[j], 0)]);
  let Gr = matrix(pick(G, d, d));
  let Br = matrix(pick(Bu, d, [0]));
  let Gss_inv: Matrix | null = null;
  if (s.length > 0) {
    Gss_inv = inv(matrix(pick(G, s, s)));
    const Gds = matrix(pick(G, d, s));
    Gr = subtract(Gr, multiply(multiply(Gds, Gss_inv), matrix(pick(G, s, d)))) as Matrix;
    Br = subtract(Br, multiply(multiply(Gds, Gss_inv), matrix(pick(Bu, s, [0])))) as Matrix;
  }
  const Cinv = matrix(d.map((i, r) => d.map((_, c) => (r === c ? 1 / C[i] : 0))));
  const A = multiply(-1, multiply(Cinv, Gr)) as Matrix;
  const Tinf = lusolve(Gr, Br) as Matrix;
  const dev = subtract(matrix(d.map((i) => [T0[i]])), Tinf) as Matrix;
  const Td = toArray(add(Tinf, multiply(expmScaled(A, h), dev)) as Matrix).map((r) => r[0]);
  const T = new Array<number>(N).fill(0);
  d.forEach((i, r) => (T[i] = Td[r]));
  if (Gss_inv) {
    const rhs = subtract(matrix(pick(Bu, s, [0])), multiply(matrix(pick(G, s, d)), matrix(Td.map((v) => [v])))) as Matrix;
    const Ts = toArray(multiply(Gss_inv, rhs) as Matrix).map((r) => r[0]);
    s.forEach((i, r) => (T[i] = Ts[r]));
  }
  return T;
}

describe('modal solver against the matrix exponential (mathjs expm)', () => {
  it.each([
    [11, 0],
    [29, 0],
    [47, 0],
    [83, 2],
    [97, 3],
  ])('random network, seed %i, %i massless nodes: advance matches to 1e-9 relative', (seed, massless) => {
    const spec = randomNetwork(seed, massless);
    const model = compileNetwork(spec);
    const rnd = seededRandom(seed + 1);
    const T0 = spec.nodes.map(() => 20 + 80 * rnd());
    const u = [30 * rnd(), 15 * rnd(), 35];
    for (const h of [1e-3, 0.1, 3, 60, 1e4]) {
      const got = advance(model, T0, u, h);
      const expected = expmReference(spec, T0, u, h);
      const scale = Math.max(...expected.map(Math.abs));
      got.forEach((v, i) => {
        // Reference: mathjs expm (Padé with scaling and squaring) of the same C, G, B.
        expect(Math.abs(v - expected[i])).toBeLessThanOrEqual(1e-9 * scale);
      });
    }
  });

  it('steady state matches a direct solve G T = B u (mathjs lusolve)', () => {
    const spec = randomNetwork(5, 1);
    const { G, B } = reference(spec);
    const u = [12, 7, 40];
    const expected = toArray(lusolve(G, B.map((row) => [row.reduce((s, b, j) => s + b * u[j], 0)])) as number[][]).map((r) => r[0]);
    const got = steadyState(compileNetwork(spec), u);
    got.forEach((v, i) => expect(Math.abs(v - expected[i])).toBeLessThanOrEqual(1e-12 * Math.abs(expected[i])));
  });

  it('zth between an input and every node matches the expm step response', () => {
    const spec = randomNetwork(61);
    const model = compileNetwork(spec);
    const N = spec.nodes.length;
    for (const t of [1e-2, 1, 100]) {
      // Unit step of input 1 from equilibrium at 0 °C ambient.
      const expected = expmReference(spec, new Array(N).fill(0), [0, 1, 0], t);
      for (let j = 0; j < N; j++) {
        expect(Math.abs(zth(model, 1, j, t) - expected[j])).toBeLessThanOrEqual(1e-9 * Math.max(...expected.map(Math.abs)));
      }
    }
  });
});
