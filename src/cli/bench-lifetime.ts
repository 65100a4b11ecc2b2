import { evaluateStudy, INTERACTIVE_MAX_STRETCHES, parseStudy } from '../core/study';
import { rainflow, rainflowPeriodic } from '../core/reliability';
import { liveEditDocument, LIVE_SEGMENTS } from './bench-live';
import { createJunctionHistory } from '../core/study/junction-history';
import { lifetimeResult } from '../core/study/lifetime-result';

/** Points of the timed rainflow count. */
const RAINFLOW_POINTS = 1_000_000;

export type LifetimeBenchCase = { label: string; method: string; plainMs: number; withLifetimeMs: number; addedMs: number; addedPercent: number };
export type LifetimeBench = {
  segments: number;
  cases: LifetimeBenchCase[];
  /** The lifetime work alone on the same study's solved boundaries: history, rainflow, damage. */
  historyOnly: { points: number; devices: number; ms: number };
  rainflowPoints: number;
  rainflowMs: number;
  rainflowPeriodicMs: number;
};

/** CPU time of f, ms (less disturbed than wall time on a shared machine). */
const time = (f: () => void): number => {
  const t0 = process.cpuUsage();
  f();
  const d = process.cpuUsage(t0);
  return (d.user + d.system) / 1000;
};

const best = (runs: number, f: () => void): number => {
  let min = Infinity;
  for (let i = 0; i < runs; i++) min = Math.min(min, time(f));
  return min;
};

/** Best times of a and b run in turn, so a busy machine slows both alike. */
function bestOfPairs(runs: number, a: () => void, b: () => void): [number, number] {
  let ta = Infinity;
  let tb = Infinity;
  for (let i = 0; i < runs; i++) {
    ta = Math.min(ta, time(a));
    tb = Math.min(tb, time(b));
  }
  return [ta, tb];
}

/** Random walk of n points (a 32-bit linear congruential generator, so every run counts the same history). */
function walk(n: number): Float64Array {
  const out = new Float64Array(n);
  let state = 12345;
  let v = 60;
  for (let i = 0; i < n; i++) {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    v += state / 2 ** 32 - 0.5;
    out[i] = v;
  }
  return out;
}

/**
 * Added cost of `lifetime` (the junction history and its rainflow count) and `touch` on the
 * 10,000-segment live-edit study: on its own event-driven path (natural-convection sink), and
 * with the sink made linear (batch path); with and without chart series. Best CPU time of 9, the
 * two documents timed in turn. `site` is left out: it changes the sinks, so the solve itself.
 */
export function benchLifetime(): LifetimeBench {
  const raw = liveEditDocument();
  const sinks = (raw.sinks as Record<string, unknown>[]).map(({ naturalConvection: _nc, ...s }) => s);
  const extra = { lifetime: { mission: { hoursPerDay: 8 }, arrhenius: { referenceC: 55 } }, touch: {} };
  const variants: [string, Record<string, unknown>][] = [
    ['natural-convection sink', raw],
    ['constant Rθsa', { ...raw, sinks }],
  ];
  const cases: LifetimeBenchCase[] = [];
  for (const [name, doc] of variants) {
    const plain = parseStudy(doc);
    const full = parseStudy({ ...doc, ...extra });
    for (const seriesPoints of [0, 2000]) {
      const options = { maxStretches: INTERACTIVE_MAX_STRETCHES, seriesPoints };
      const method = evaluateStudy(plain, options).solver.method;
      evaluateStudy(full, options);
      const [plainMs, withLifetimeMs] = bestOfPairs(
        9,
        () => evaluateStudy(plain, options),
        () => evaluateStudy(full, options),
      );
      cases.push({
        label: `${name}, ${seriesPoints === 0 ? 'no chart series' : 'with chart series'}`,
        method,
        plainMs,
        withLifetimeMs,
        addedMs: withLifetimeMs - plainMs,
        addedPercent: (100 * (withLifetimeMs - plainMs)) / plainMs,
      });
    }
  }
  const full = parseStudy({ ...raw, ...extra });
  const table = evaluateStudy(full, { maxStretches: INTERACTIVE_MAX_STRETCHES, seriesPoints: 0, boundaryRows: 1_000_000 }).table!;
  const width = table.columns.length + 1;
  const junctionColumns = full.devices.map((d) => 1 + table.columns.indexOf(`${d.id}.junction`));
  const endS = table.values[(table.rows - 1) * width];
  const historyOnly = best(9, () => {
    const h = createJunctionHistory(full.devices.length, endS, full.lifetime!.arrhenius);
    for (let r = 0; r < table.rows; r++) {
      for (let d = 0; d < junctionColumns.length; d++) h.add(d, table.values[r * width], table.values[r * width + junctionColumns[d]]);
    }
    lifetimeResult(full, h, false);
  });
  const history = walk(RAINFLOW_POINTS);
  rainflow(history);
  return {
    segments: LIVE_SEGMENTS,
    cases,
    historyOnly: { points: table.rows, devices: full.devices.length, ms: historyOnly },
    rainflowPoints: RAINFLOW_POINTS,
    rainflowMs: best(3, () => rainflow(history)),
    rainflowPeriodicMs: best(3, () => rainflowPeriodic(history)),
  };
}
