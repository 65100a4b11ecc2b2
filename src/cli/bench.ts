import { compileNetwork, runProfile, simulateTrapezoidal, type ModalModel } from '../core/thermal';
import fs from 'node:fs';
import path from 'node:path';
import { evaluateStudy, parseStudy } from '../core/study';
import { benchHeatsinkRanking } from './bench-heatsink';
import { benchLiveEdit } from './bench-live';
import { benchTolerance } from './bench-tolerance';
import { benchLifetime } from './bench-lifetime';
import { benchNetwork, benchProfile } from './bench-network';

/** Segments of the timed modal run, solved in chunks so memory stays flat. */
const SEGMENTS = 1_000_000;
const CHUNK = 50_000;
/** Segments of the shorter profile on which the trapezoidal integrator is tuned and timed. */
const TRAP_SEGMENTS = 2000;
/** Peak accuracy the trapezoidal step must reach, K. */
const PEAK_TOL_K = 1e-3;

const now = () => Number(process.hrtime.bigint()) / 1e9;
/**
 * Seconds of CPU this process has used, printed beside the solver's wall times. The solver
 * figures themselves are the best wall time of a few runs of one thread: the process's CPU
 * time also counts its other threads (under tsx's ES-module loader, measured at about a sixth
 * above the solver's wall time), and the best of several runs is what the machine gives when
 * nothing else runs.
 */
const cpuNow = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
};
const peakRssMB = () => process.resourceUsage().maxRSS / 1024;

type Chunk = { durations: Float64Array; inputs: Float64Array };

function modalRun(model: ModalModel, chunk: Chunk, watch: number[], segments = SEGMENTS): { seconds: number; cpuSeconds: number; peak: number } {
  let T: Float64Array | undefined;
  let peak = -Infinity;
  const start = now();
  const cpuStart = cpuNow();
  for (let done = 0; done < segments; done += CHUNK) {
    const r = runProfile(model, chunk, { initial: T, watchNodes: watch });
    for (const p of r.peaks) peak = Math.max(peak, p.valueC);
    T = r.final;
  }
  return { seconds: now() - start, cpuSeconds: cpuNow() - cpuStart, peak };
}

/** How long the app takes to evaluate each demo study, the "live results" case. */
function demoStudyTimes() {
  const dir = path.resolve(__dirname, '..', '..', 'examples');
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith('.json'))
    .map((file) => {
      const doc = parseStudy(JSON.parse(fs.readFileSync(path.join(dir, file), 'utf8')));
      let best = Infinity;
      let r = evaluateStudy(doc);
      for (let i = 0; i < 5; i++) {
        const t0 = now();
        r = evaluateStudy(doc);
        best = Math.min(best, now() - t0);
      }
      return { file, milliseconds: best * 1000, stretches: r.solver.stretches, method: r.solver.method };
    });
}

async function main(argv: string[]): Promise<void> {
  const json = argv.includes('--json');
  const { spec, junctions } = benchNetwork();
  const model = compileNetwork(spec);
  const chunk = benchProfile(CHUNK);
  modalRun(model, chunk, junctions, 2 * CHUNK); // warm-up: let the JIT compile the loop
  const rssAfter100k = peakRssMB();
  const runs = [0, 1, 2, 3, 4].map(() => modalRun(model, chunk, junctions));
  const best = Math.min(...runs.map((r) => r.seconds));
  const bestCpu = Math.min(...runs.map((r) => r.cpuSeconds));
  const segmentsPerSecond = SEGMENTS / best;
  const rssAfter1M = peakRssMB();
  // The same network on a repeating 20-segment pattern (a pulse train): the case the solver's caches serve.
  const pattern = benchProfile(20, 777);
  const repeating: Chunk = {
    durations: Float64Array.from({ length: CHUNK }, (_, s) => pattern.durations[s % 20]),
    inputs: Float64Array.from({ length: CHUNK * 3 }, (_, i) => pattern.inputs[(Math.floor(i / 3) % 20) * 3 + (i % 3)]),
  };
  modalRun(model, repeating, junctions, 2 * CHUNK);
  const repeatingSeconds = Math.min(...[0, 1, 2, 3, 4].map(() => modalRun(model, repeating, junctions).seconds));

  // Equal accuracy: halve the trapezoidal step until both junction peaks of a shorter
  // profile agree with the exact modal peaks to PEAK_TOL_K, then time that step.
  const short = { durations: chunk.durations.subarray(0, TRAP_SEGMENTS), inputs: chunk.inputs.subarray(0, TRAP_SEGMENTS * 3) };
  const exact = runProfile(model, short, { watchNodes: junctions }).peaks.map((p) => p.valueC);
  // A step counts only when half of it passes too, so a lucky cancellation cannot pick it.
  const errorAt = (dt: number) => {
    const trap = simulateTrapezoidal(spec, short, { dtS: dt, watchNodes: junctions });
    return Math.max(...trap.peaks.map((p, w) => Math.abs(p.valueC - exact[w])));
  };
  let dtS = 0.1;
  let peakErrorK = errorAt(dtS);
  for (let k = 0; k < 30; k++) {
    const half = errorAt(dtS / 2);
    if (peakErrorK <= PEAK_TOL_K && half <= PEAK_TOL_K) break;
    dtS /= 2;
    peakErrorK = half;
  }
  // Best of 5, as the modal figure is.
  let trapSeconds = Infinity;
  for (let i = 0; i < 5; i++) {
    const t0 = now();
    simulateTrapezoidal(spec, short, { dtS, watchNodes: junctions });
    trapSeconds = Math.min(trapSeconds, now() - t0);
  }
  const modalShort = (() => {
    const s = now();
    for (let i = 0; i < 200; i++) runProfile(model, short, { watchNodes: junctions });
    return (now() - s) / 200;
  })();
  const trapPerSegment = trapSeconds / TRAP_SEGMENTS;
  const speedupVsTrapezoidal = trapPerSegment / (best / SEGMENTS);

  const heatsinkRanking = benchHeatsinkRanking();
  const demoStudies = demoStudyTimes();
  const liveEdit = benchLiveEdit();
  const lifetime = benchLifetime();
  const tolerance = await benchTolerance();

  const result = {
    runtime: { node: process.version, execArgv: process.execArgv },
    segments: SEGMENTS,
    nodes: spec.nodes.length,
    modes: model.modeCount,
    stiffness: model.stiffness,
    modalSeconds: best,
    modalCpuSeconds: bestCpu,
    segmentsPerSecond,
    segmentsPerSecondRepeatingPattern: SEGMENTS / repeatingSeconds,
    trapezoidal: {
      profileSegments: TRAP_SEGMENTS,
      dtS,
      stepsPerSegment: chunk.durations.subarray(0, TRAP_SEGMENTS).reduce((a, h) => a + Math.ceil(h / dtS), 0) / TRAP_SEGMENTS,
      peakErrorK,
      seconds: trapSeconds,
      secondsPerSegment: trapPerSegment,
      estimatedSecondsFor1e6: trapPerSegment * SEGMENTS,
    },
    modalSecondsSameShortProfile: modalShort,
    speedupVsTrapezoidal,
    speedupSameShortProfile: trapSeconds / modalShort,
    peakRssMB: peakRssMB(),
    peakRssAfter100kSegmentsMB: rssAfter100k,
    peakRssAfter1MSegmentsMB: rssAfter1M,
    heatsinkRanking,
    demoStudies,
    liveEdit,
    lifetime,
    tolerance,
    targets: { segmentsPerSecond: 5e6, speedupVsTrapezoidal: 50, heatsinkRankingSeconds: heatsinkRanking.targetSeconds },
  };
  if (json) {
    process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
    return;
  }
  const f = (v: number, d = 3) => v.toPrecision(d);
  const lines = [
    `Runtime: node ${process.version}${process.execArgv.length ? ` ${process.execArgv.join(' ')}` : ''} (npm run bench uses tsx's CommonJS hook: the ES-module loader runs this loop 20–30 % slower)`,
    `Modal solver: ${SEGMENTS.toLocaleString('en')} segments on an ${result.nodes}-node network (two devices on one sink), random durations 1–100 ms and powers`,
    `  best of 5: ${f(best)} s → ${f(segmentsPerSecond)} segments/s (target ≥ 5e6); process CPU ${f(bestCpu)} s`,
    `  on a repeating 20-segment pattern instead: ${f(result.segmentsPerSecondRepeatingPattern)} segments/s`,
    `Trapezoidal integrator at equal accuracy (junction peaks within ${PEAK_TOL_K} K of the exact ones):`,
    `  step ${f(dtS)} s (${f(result.trapezoidal.stepsPerSegment)} steps/segment), peak error ${f(peakErrorK)} K`,
    `  timed on the first ${TRAP_SEGMENTS} segments (best of 5): ${f(trapSeconds)} s, scaled to ${SEGMENTS.toLocaleString('en')} segments: ${f(result.trapezoidal.estimatedSecondsFor1e6)} s (an estimate, not a run)`,
    `  speed-up of the modal solver: ${f(speedupVsTrapezoidal)}× (target ≥ 50×); on the same ${TRAP_SEGMENTS} segments: ${f(result.speedupSameShortProfile)}×`,
    `Peak resident memory: ${f(rssAfter100k)} MB after 100,000 segments, ${f(rssAfter1M)} MB after 3 × 1,000,000 (the modal run works in ${CHUNK.toLocaleString('en')}-segment chunks), ${f(result.peakRssMB)} MB at the end (trapezoidal runs included)`,
  ];
  lines.push(`Heatsink ranking: 1,000 candidate sinks × 10,000-segment profile, two devices on one sink (target < ${heatsinkRanking.targetSeconds} s)`);
  for (const c of heatsinkRanking.cases) lines.push(`  ${c.label}: ${f(c.cpuSeconds)} s CPU (${f(c.wallSeconds)} s wall), ${c.passing} pass`);
  lines.push('Demo studies, full evaluation as the app runs it (best of 5):');
  for (const d of demoStudies) lines.push(`  ${d.file}: ${f(d.milliseconds)} ms, ${d.stretches} stretches, ${d.method}`);
  lines.push(`Live edit: lab supply with a ${liveEdit.segments.toLocaleString('en')}-segment profile, rail plan and SOA (best of 5; the editor's budget is about 100 ms)`);
  lines.push(`  parse ${f(liveEdit.parseMs)} ms; the editor's verdict solve (SOA at the peak case temperature) ${f(liveEdit.verdictMs)} ms from scratch, ${f(liveEdit.editVerdictMs)} ms after an ambient edit (parse and tap selection kept, as in the editor's worker)`);
  lines.push(`  SOA per stretch, as the full results: ${f(liveEdit.withSoaMs)} ms (${f(liveEdit.withoutSoaMs)} ms without SOA); with chart series ${f(liveEdit.withSeriesMs)} ms`);
  lines.push(`Lifetime and touch on the ${lifetime.segments.toLocaleString('en')}-segment live-edit study (best CPU time of 9, timed in turn):`);
  for (const c of lifetime.cases) lines.push(`  ${c.label} (${c.method}): ${f(c.plainMs)} ms → ${f(c.withLifetimeMs)} ms (${c.addedMs >= 0 ? '+' : ''}${f(c.addedMs, 2)} ms)`);
  lines.push(`  the lifetime work alone on its ${lifetime.historyOnly.points.toLocaleString('en')} solved boundaries: ${f(lifetime.historyOnly.ms)} ms`);
  lines.push(`Rainflow count of ${lifetime.rainflowPoints.toLocaleString('en')} points: ${f(lifetime.rainflowMs)} ms open, ${f(lifetime.rainflowPeriodicMs)} ms as a repeating block`);
  lines.push(`Tolerance sweep: ${tolerance.runs.toLocaleString('en')} Monte Carlo runs of a ${tolerance.segments.toLocaleString('en')}-segment study (two devices in parallel, every spread)`);
  lines.push(`  worker pool of ${tolerance.threads} threads: ${f(tolerance.poolWallSeconds)} s wall → ${f(tolerance.poolRunsPerSecond)} runs/s (${f(tolerance.speedup)}× one thread)`);
  lines.push(`  one thread: ${f(tolerance.singleThreadRunsPerSecond)} runs/s over ${tolerance.singleThreadRuns} runs, ${f(tolerance.singleThreadEstimatedSecondsForAll)} s for all (an estimate, not a run)`);
  process.stdout.write(`${lines.join('\n')}\n`);
}

main(process.argv.slice(2)).catch((err) => {
  console.error(err);
  process.exit(1);
});
