import { advance, compileNetwork, peakInSegment, runProfile, PROFILE_BLOCK_SIZE } from '@/core/thermal';
import type { NetworkSpec } from '@/core/thermal';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { seededRandom } from '../../helpers/seeded-random';

// runProfile solves a peaks-only run block by block (modes stepped through a block in turn)
// and a run that records boundaries segment by segment. The two share their arithmetic, so
// they must report the same peaks (to rounding); the reference for both is the exact solution itself:
// peakInSegment on each segment from the state `advance` reaches (PHYSICS.md §3).

/** A random chain of `devices` junction–case pairs on one sink, and the ambient input last. */
function randomNetwork(random: () => number, devices: number): NetworkSpec {
  const nodes = [];
  const links = [];
  for (let d = 0; d < devices; d++) {
    nodes.push({ id: `j${d}`, capacityJPerK: 0.01 + random() }, { id: `c${d}`, capacityJPerK: 1 + 10 * random() });
    links.push({ a: `j${d}`, b: `c${d}`, rKPerW: 0.1 + random() }, { a: `c${d}`, b: 'sink', rKPerW: 0.1 + random() });
  }
  nodes.push({ id: 'sink', capacityJPerK: 100 + 500 * random() });
  links.push({ a: 'sink', b: 'ambient', rKPerW: 0.2 + random() });
  return { nodes, links, heatInputs: Array.from({ length: devices }, (_, d) => `j${d}`) };
}

function randomProfile(random: () => number, segments: number, devices: number) {
  const q = devices + 1;
  const durations = new Float64Array(segments);
  const inputs = new Float64Array(segments * q);
  for (let s = 0; s < segments; s++) {
    // Some zero-length segments and some repeats, which take other paths through the loops.
    durations[s] = random() < 0.05 ? 0 : random() < 0.2 ? 0.5 : 10 ** (-3 + 4 * random());
    for (let j = 0; j < devices; j++) inputs[s * q + j] = random() < 0.3 ? 0 : 40 * random();
    inputs[s * q + devices] = 20 + 10 * random();
  }
  return { durations, inputs };
}

describe('runProfile in blocks', () => {
  // 1, 3 and 5 devices: 2, 4 and 6 inputs, both sides of the four-input unrolled path.
  it.each([1, 3, 5])('reports the same peaks as the per-segment run (%i devices)', (devices) => {
    const random = seededRandom(400 + devices);
    const model = compileNetwork(randomNetwork(random, devices));
    const segments = 2 * PROFILE_BLOCK_SIZE + 37;
    const profile = randomProfile(random, segments, devices);
    const watch = Array.from({ length: model.nodeCount }, (_, i) => i);
    const blocked = runProfile(model, profile, { watchNodes: watch });
    const recorded = runProfile(model, profile, { watchNodes: watch, recordBoundaries: true });
    // The state is stepped by the same arithmetic, so it ends bit for bit the same; a node's
    // value is summed over its modes in another order, so peaks agree to rounding.
    Array.from(blocked.final).forEach((v, i) => expect(v).toBe(recorded.final[i]));
    blocked.peaks.forEach((p, w) => {
      assertInDelta(p.valueC, recorded.peaks[w].valueC, 1e-12 * Math.abs(recorded.peaks[w].valueC), `peak of node ${w}`);
      assertInDelta(p.timeS, recorded.peaks[w].timeS, 1e-9 * Math.max(1, recorded.peaks[w].timeS), `time of node ${w}`);
    });
  });

  it('finds the exact maximum of every watched node over a random profile', () => {
    const random = seededRandom(97);
    const devices = 2;
    const q = devices + 1;
    const model = compileNetwork(randomNetwork(random, devices));
    const profile = randomProfile(random, PROFILE_BLOCK_SIZE + 11, devices);
    const watch = Array.from({ length: model.nodeCount }, (_, i) => i);
    const run = runProfile(model, profile, { watchNodes: watch });
    // Segment by segment from the first input's uniform start, as runProfile starts.
    let T = new Array(model.nodeCount).fill(profile.inputs[q - 1]);
    const best = watch.map(() => -Infinity);
    for (let s = 0; s < profile.durations.length; s++) {
      const u = Array.from(profile.inputs.subarray(s * q, s * q + q));
      const h = profile.durations[s];
      if (h === 0) continue;
      for (const w of watch) best[w] = Math.max(best[w], peakInSegment(model, T, u, h, w).valueC);
      T = Array.from(advance(model, T, u, h));
    }
    // Both are exact; they differ only by rounding along the 267 segments.
    watch.forEach((w) => assertInDelta(run.peaks[w].valueC, best[w], 1e-9, `node ${w}`));
  });
});
