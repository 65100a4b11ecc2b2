import {
  prepareRanking,
  rankPrepared,
  type RankingResult,
  type RankingSegment,
  type RankingSetup,
  type SinkCandidate,
} from '../core/heatsink';

/**
 * Ranking benchmark: a catalogue of invented sinks (demo data) ranked on a long profile of two
 * pass devices sharing one sink. Timed with CPU time of this process (other processes on the
 * machine do not count) and wall time, best of a few repeats.
 */

const CANDIDATES = 1000;
const SEGMENTS = 10_000;

/** Deterministic pseudo-random numbers (linear congruential generator, Numerical Recipes' constants). */
function generator(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296;
  };
}

/** Demo data: sinks from small clip-ons (8 K/W) to large extrusions (0.2 K/W). */
export function benchCatalogue(count = CANDIDATES, seed = 2024): SinkCandidate[] {
  const next = generator(seed);
  return Array.from({ length: count }, (_, i) => {
    const rsa = 0.2 * Math.pow(40, next());
    const massKg = 0.05 * Math.pow(rsa / 8, -1.3) * (0.8 + 0.4 * next());
    const c: SinkCandidate = {
      id: `demo-${i + 1}`,
      name: `Demo sink ${i + 1}`,
      natural: { rthKPerW: rsa, referenceRiseK: 75 },
      massKg,
      material: 'aluminium',
      volumeM3: (massKg / 2700) * (2 + 2 * next()),
      price: 2 + 30 * massKg * (0.7 + 0.6 * next()),
    };
    if (next() < 0.3) {
      c.forcedAir = [1, 2, 4].map((v) => ({ airSpeedMPerS: v, rthKPerW: (0.55 * rsa) / Math.sqrt(v) }));
    }
    return c;
  });
}

/**
 * Two devices of an invented linear stage on one sink: a regulator (4-term Foster set) and a
 * pass transistor (3-stage Cauer ladder). The profile: a load cycle of levels and durations
 * from a small set (as a study's repeated groups give), or with every duration and power
 * different (distinct = true), the case where nothing can be reused.
 */
export function benchSetup(segments = SEGMENTS, distinct = false, periodic = false, seed = 99): RankingSetup {
  const next = generator(seed);
  const levels = [0, 4, 9, 15, 22];
  const lengths = [0.5, 2, 5, 20];
  const list: RankingSegment[] = [];
  for (let s = 0; s < segments; s++) {
    const durationS = distinct ? 0.2 + 20 * next() : lengths[Math.floor(next() * lengths.length)];
    const reg = distinct ? 22 * next() : levels[Math.floor(next() * levels.length)];
    const pass = distinct ? 30 * next() : 1.5 * levels[Math.floor(next() * levels.length)];
    list.push({ durationS, powerW: { reg: reg, pass: pass } });
  }
  return {
    devices: [
      {
        id: 'reg',
        tjMaxC: 150,
        package: { kind: 'foster', terms: [{ rKPerW: 0.05, tauS: 0.001 }, { rKPerW: 0.2, tauS: 0.01 }, { rKPerW: 0.35, tauS: 0.1 }, { rKPerW: 0.4, tauS: 1 }] },
        interfaceRthKPerW: 0.3,
      },
      {
        id: 'pass',
        tjMaxC: 175,
        package: { kind: 'cauer', stages: [{ rKPerW: 0.1, capacityJPerK: 0.05 }, { rKPerW: 0.25, capacityJPerK: 0.6 }, { rKPerW: 0.2, capacityJPerK: 5 }] },
        interfaceRthKPerW: 0.2,
      },
    ],
    segments: list,
    periodic,
    ambientC: 40,
    marginK: 20,
  };
}

export type HeatsinkBenchCase = {
  label: string;
  candidates: number;
  segments: number;
  distinctDurations: number;
  periodic: boolean;
  cpuSeconds: number;
  wallSeconds: number;
  profileRuns: number;
  interiorSearches: number;
  passing: number;
  smallest: string | null;
  steadyChoice: string | null;
  thermalMassGainFraction: number | null;
};

function timeRanking(label: string, setup: RankingSetup, catalogue: SinkCandidate[], repeats: number): HeatsinkBenchCase {
  const prep = prepareRanking(setup);
  rankPrepared(prep, catalogue.slice(0, 50)); // warm-up: let the JIT compile the loops
  let best: { cpu: number; wall: number; result: RankingResult } | null = null;
  for (let r = 0; r < repeats; r++) {
    const cpu0 = process.cpuUsage();
    const wall0 = process.hrtime.bigint();
    const result = rankPrepared(prep, catalogue);
    const wall = Number(process.hrtime.bigint() - wall0) / 1e9;
    const used = process.cpuUsage(cpu0);
    const cpu = (used.user + used.system) / 1e6;
    if (!best || cpu < best.cpu) best = { cpu, wall, result };
  }
  const { cpu, wall, result } = best!;
  return {
    label,
    candidates: catalogue.length,
    segments: setup.segments.length,
    distinctDurations: new Set(setup.segments.map((s) => s.durationS)).size,
    periodic: setup.periodic === true,
    cpuSeconds: cpu,
    wallSeconds: wall,
    profileRuns: result.stats.profileRuns,
    interiorSearches: result.stats.interiorSearches,
    passing: result.passing.length,
    smallest: result.smallest?.id ?? null,
    steadyChoice: result.steadyChoice?.id ?? null,
    thermalMassGainFraction: result.thermalMassGain?.fraction ?? null,
  };
}

/** Runs the ranking benchmark cases; the main bench script calls this. */
export function benchHeatsinkRanking(repeats = 3): { cases: HeatsinkBenchCase[]; targetSeconds: number } {
  const catalogue = benchCatalogue();
  return {
    cases: [
      timeRanking('load cycle from a few levels and durations, from cold', benchSetup(), catalogue, repeats),
      timeRanking('the same profile, periodic steady state', benchSetup(SEGMENTS, false, true), catalogue, repeats),
      timeRanking('every duration and power different, from cold', benchSetup(SEGMENTS, true), catalogue, repeats),
      // The sink leads to the air of a housing (invented: 0.3 K/W to the room, 5 kJ/K): one node more per candidate.
      timeRanking('the load cycle with the sink in an enclosure, from cold', { ...benchSetup(), enclosure: { rthKPerW: 0.3, capacityJPerK: 5000 } }, catalogue, repeats),
    ],
    targetSeconds: 2,
  };
}

function main(argv: string[]): void {
  const report = benchHeatsinkRanking();
  if (argv.includes('--json')) {
    process.stdout.write(`${JSON.stringify(report, null, 2)}\n`);
    return;
  }
  const f = (v: number) => v.toPrecision(3);
  const lines = [`Heatsink ranking: ${CANDIDATES} candidate sinks × ${SEGMENTS.toLocaleString('en')}-segment profile, two devices on one sink (target < ${report.targetSeconds} s)`];
  for (const c of report.cases) {
    lines.push(
      `  ${c.label}: ${f(c.cpuSeconds)} s CPU (${f(c.wallSeconds)} s wall), ${c.profileRuns} profile runs, ` +
        `${c.interiorSearches} interior searches, ${c.distinctDurations} distinct durations; ` +
        `${c.passing} pass, smallest ${c.smallest ?? '—'}, steady answer ${c.steadyChoice ?? '—'}` +
        (c.thermalMassGainFraction === null ? '' : ` (${f(100 * c.thermalMassGainFraction)} % lighter thanks to thermal mass)`),
    );
  }
  process.stdout.write(`${lines.join('\n')}\n`);
}

if (require.main === module) main(process.argv.slice(2));
