import { RATE_MERGE_REL_TOL, ROOT_MAX_ITERATIONS, ROOT_TIME_REL_TOL } from './constants';

// Module-level copies: under CommonJS an imported binding is read through a getter each time.
const MERGE_TOL = RATE_MERGE_REL_TOL;
const MAX_ITERATIONS = ROOT_MAX_ITERATIONS;
const TIME_TOL = ROOT_TIME_REL_TOL;

/**
 * Root isolation for exponential sums g(τ) = Σ c_k e^(−r_k τ), 0 ≤ r_0 < r_1 < …
 *
 * Rolle's theorem applied to e^(r_0 τ) g(τ), whose derivative is again an exponential sum
 * with one term fewer (the argument behind Descartes' rule of signs for exponential sums;
 * Pólya & Szegő, Problems and Theorems in Analysis II, Part V, from memory): between two
 * consecutive roots of that derivative g is monotone up to a positive factor, so it has at
 * most one root there. Recursing down to one term gives every sign change on [t0, t1].
 */
export type ExpSumWorkspace = {
  readonly maxTerms: number;
  /** Level 0 is the caller's sum; level L + 1 is the derivative of e^(r_0 τ) × level L. */
  readonly coef: Float64Array;
  readonly rate: Float64Array;
  readonly roots: Float64Array;
  readonly termCount: Int32Array;
  readonly rootCount: Int32Array;
  /** Number of terms the caller placed at level 0. */
  count: number;
};

export function createExpSumWorkspace(maxTerms: number): ExpSumWorkspace {
  const size = Math.max(1, maxTerms) ** 2;
  return {
    maxTerms: Math.max(1, maxTerms),
    coef: new Float64Array(size),
    rate: new Float64Array(size),
    roots: new Float64Array(size),
    termCount: new Int32Array(Math.max(1, maxTerms)),
    rootCount: new Int32Array(Math.max(1, maxTerms)),
    count: 0,
  };
}

/** Starts a new level-0 sum. */
export function resetSum(ws: ExpSumWorkspace): void {
  ws.count = 0;
}

/**
 * Adds c e^(−r τ) to the level-0 sum; terms must come in ascending r. Rates within
 * RATE_MERGE_REL_TOL of the previous one are merged (repeated eigenvalues); zero
 * coefficients are dropped.
 */
export function addTerm(ws: ExpSumWorkspace, c: number, r: number): void {
  if (c === 0) return;
  const m = ws.count;
  if (m > 0 && r - ws.rate[m - 1] <= MERGE_TOL * r) {
    ws.coef[m - 1] += c;
    if (ws.coef[m - 1] === 0) ws.count = m - 1;
    return;
  }
  ws.coef[m] = c;
  ws.rate[m] = r;
  ws.count = m + 1;
}

/**
 * Sign changes of level `level` of the recursion on (t0, t1), ascending, written to
 * ws.roots[level·maxTerms …]; returns how many. Level 1 of a sum with a constant term
 * (r_0 = 0) is its derivative, so level 1 gives the extrema and level 0 the level crossings.
 */
export function isolateRoots(ws: ExpSumWorkspace, t0: number, t1: number, level: number): number {
  const M = ws.maxTerms;
  const { coef, rate, roots, termCount, rootCount } = ws;
  termCount[0] = ws.count;
  let depth = 0;
  // A level whose coefficients change sign at most once has at most one root on the whole
  // line (Descartes' rule for exponential sums): bracketing [t0, t1] finds it, so the
  // descent stops there instead of going down to a single term.
  while (termCount[depth] > 1 && !(depth >= level && changesAtMostOnce(coef, depth * M, termCount[depth]))) {
    const src = depth * M;
    const dst = src + M;
    const r0 = rate[src];
    let scale = 0;
    for (let k = 1; k < termCount[depth]; k++) scale = Math.max(scale, Math.abs(coef[src + k] * (r0 - rate[src + k])));
    if (!(scale > 0 && scale < Infinity)) break;
    // Positive rescaling keeps every coefficient in range without moving any root.
    for (let k = 1; k < termCount[depth]; k++) {
      coef[dst + k - 1] = (coef[src + k] * (r0 - rate[src + k])) / scale;
      rate[dst + k - 1] = rate[src + k] - r0;
    }
    termCount[depth + 1] = termCount[depth] - 1;
    depth++;
  }
  if (level > depth) return 0;
  rootCount[depth] = termCount[depth] > 1 ? bracketRoot(ws, depth, t0, t1) : 0;
  for (let L = depth - 1; L >= level; L--) {
    const base = L * M;
    const critical = (L + 1) * M;
    let count = 0;
    let a = t0;
    let ea = shifted(coef, rate, base, termCount[L], a);
    for (let j = 0; j <= rootCount[L + 1]; j++) {
      const b = j < rootCount[L + 1] ? roots[critical + j] : t1;
      if (!(b > a)) continue;
      const eb = shifted(coef, rate, base, termCount[L], b);
      if (ea * eb < 0) roots[base + count++] = refine(coef, rate, base, termCount[L], a, b, ea, eb, t1 - t0);
      else if (eb === 0 && b < t1) roots[base + count++] = b;
      a = b;
      ea = eb;
    }
    rootCount[L] = count;
  }
  return rootCount[level];
}

function changesAtMostOnce(coef: Float64Array, base: number, count: number): boolean {
  let changes = 0;
  for (let k = base + 1; k < base + count; k++) if (coef[k] > 0 !== coef[k - 1] > 0 && ++changes > 1) return false;
  return true;
}

/** The one possible root of a level with at most one sign change, if it lies in (t0, t1). */
function bracketRoot(ws: ExpSumWorkspace, L: number, t0: number, t1: number): number {
  const base = L * ws.maxTerms;
  const n = ws.termCount[L];
  const ea = shifted(ws.coef, ws.rate, base, n, t0);
  const eb = shifted(ws.coef, ws.rate, base, n, t1);
  if (ea * eb < 0) {
    ws.roots[base] = refine(ws.coef, ws.rate, base, n, t0, t1, ea, eb, t1 - t0);
    return 1;
  }
  return 0;
}

/** e^(r_0 τ) g(τ) for the sum at base: same sign as g, no underflow at large τ. */
export function shifted(coef: Float64Array, rate: Float64Array, base: number, count: number, t: number): number {
  const r0 = rate[base];
  let v = 0;
  for (let k = 0; k < count; k++) v += coef[base + k] * Math.exp(-(rate[base + k] - r0) * t);
  return v;
}

/** A few units of roundoff of ln P − ln N (a relative difference of P and N). */
const ROUNDING_LEVEL = 8 * Number.EPSILON;

/**
 * Root of g(τ) = Σ c_k e^(−r_k τ) (sum at base) in a bracket [a, b] where it changes sign
 * (ea, eb: values of the shifted sum at a and b; only their signs are used).
 *
 * Newton runs on φ(τ) = ln P(τ) − ln N(τ), P and N the sums of the positive and of the
 * negative terms, which has the same sign as g. Each of ln P and ln N is a log-sum-exp,
 * close to linear in τ, so φ is nearly linear where g is steeply exponential (a two-term
 * sum is solved in one step), and each is evaluated shifted by its slowest rate, so
 * neither underflows however far apart the rates are. A step that leaves the bracket is
 * replaced by bisection. It stops when the bracket is ROOT_TIME_REL_TOL of the span or φ
 * is down to rounding noise.
 */
export function refine(
  coef: Float64Array,
  rate: Float64Array,
  base: number,
  count: number,
  a: number,
  b: number,
  ea: number,
  eb: number,
  span: number,
): number {
  const tol = TIME_TOL * span;
  // Slowest rate of each sign: the shift of its group.
  let rp = Infinity;
  let rn = Infinity;
  for (let k = 0; k < count; k++) {
    const c = coef[base + k];
    const r = rate[base + k];
    if (c > 0 && r < rp) rp = r;
    else if (c < 0 && r < rn) rn = r;
  }
  const aPositive = ea > 0 || (ea === 0 && eb < 0);
  if (!(rp < Infinity && rn < Infinity)) return 0.5 * (a + b);
  let t = 0.5 * (a + b);
  for (let it = 0; it < MAX_ITERATIONS && b - a > tol; it++) {
    let p = 0;
    let dp = 0;
    let q = 0;
    let dq = 0;
    for (let k = 0; k < count; k++) {
      const c = coef[base + k];
      const r = rate[base + k];
      if (c > 0) {
        const e = c * Math.exp(-(r - rp) * t);
        p += e;
        dp -= (r - rp) * e;
      } else {
        const e = -c * Math.exp(-(r - rn) * t);
        q += e;
        dq -= (r - rn) * e;
      }
    }
    // φ = ln P − ln N with P = e^(−rp τ) p and N = e^(−rn τ) q.
    const phi = Math.log(p) - Math.log(q) + (rn - rp) * t;
    if (phi === 0 || (phi < 0 ? -phi : phi) <= ROUNDING_LEVEL) return t;
    if (phi > 0 === aPositive) a = t;
    else b = t;
    const slope = dp / p - dq / q + (rn - rp);
    const next = t - phi / slope;
    if (next > a && next < b) {
      if (Math.abs(next - t) <= tol) return next;
      t = next;
    } else {
      t = 0.5 * (a + b);
    }
  }
  return t;
}
