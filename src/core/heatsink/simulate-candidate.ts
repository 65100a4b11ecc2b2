import { AMBIENT, compileNetwork, type NetworkSpec } from '../thermal';
import type { CheckedCandidate } from './candidate';
import type { RsaMode } from './candidate-rsa';
import { CONVECTION_REL_TOL, MAX_CONVECTION_RUNS } from './constants';
import { naturalConvectionRsa, naturalConvectionSteady } from './natural-convection';
import { scanPeaks } from './peak-scan';
import { ENCLOSURE_NODE_ID, SINK_NODE_ID, type PreparedRanking } from './ranking-setup';
import type { ScanProfile } from './scan-profile';
import type { ScanWorkspace } from './scan-workspace';

export type CandidateSimulation = {
  /** Rθsa the profile was simulated with, K/W. */
  rsaKPerW: number;
  /**
   * Time-averaged sink rise over the profile above the node its Rθsa leads to (the ambient,
   * or the enclosure air), K: Rθsa × the mean heat through it (energy balance of that run).
   */
  meanRiseK: number;
  /** Profile runs made; settled is false when Rθsa still moved more than CONVECTION_REL_TOL. */
  runs: number;
  settled: boolean;
  /** Per device, in setup order. */
  peakC: Float64Array;
  peakTimeS: Float64Array;
  interiorSearches: number;
};

/**
 * Simulates one candidate on the profile. A natural-convection sink is linearised at its
 * time-averaged rise over the profile, a fixed point found by re-running: start from the
 * rise a single RC (R, C of sink and packages) would average under the mean power (in the
 * periodic case the exact value, R × mean power), then update R on the log scale as if the
 * mean rise were proportional to R, until R moves less than CONVECTION_REL_TOL.
 *
 * With an enclosure the sink leads to the enclosure air node (its capacity), which leads to
 * the ambient; the rise is then the sink's above the enclosure air, as in the study's own
 * convection (rise above the node the sink leads to). The node is added only then, so a sink
 * that leads to the ambient costs what it did; a massless enclosure adds no mode.
 */
export function simulateCandidate(
  prep: PreparedRanking,
  scan: ScanProfile,
  candidate: CheckedCandidate,
  mode: Exclude<RsaMode, { mode: 'none' }>,
  ws: ScanWorkspace,
): CandidateSimulation {
  // The heat through Rθsa is the energy put in less what the devices and the sink stored (the
  // enclosure air, last in the node list, lies beyond Rθsa).
  const capacities = prep.nodes.map((node) => node.capacityJPerK);
  capacities.push(candidate.capacityJPerK);
  const enclosure = prep.enclosure;
  const sinkNode = { id: SINK_NODE_ID, capacityJPerK: candidate.capacityJPerK };
  const spec = (rsa: number): NetworkSpec =>
    enclosure
      ? {
          nodes: [...prep.nodes, sinkNode, { id: ENCLOSURE_NODE_ID, capacityJPerK: enclosure.capacityJPerK }],
          links: [...prep.links, { a: SINK_NODE_ID, b: ENCLOSURE_NODE_ID, rKPerW: rsa }, { a: ENCLOSURE_NODE_ID, b: AMBIENT, rKPerW: enclosure.rthKPerW }],
          heatInputs: prep.junctionIds,
        }
      : {
          nodes: [...prep.nodes, sinkNode],
          links: [...prep.links, { a: SINK_NODE_ID, b: AMBIENT, rKPerW: rsa }],
          heatInputs: prep.junctionIds,
        };

  const run = (rsa: number) => {
    const model = compileNetwork(spec(rsa));
    const watch = Int32Array.from(prep.junctionIds, (id) => model.nodeIndex.get(id) as number);
    const result = scanPeaks(model, scan, watch, prep.periodic, ws);
    let stored = 0;
    for (let i = 0; i < capacities.length; i++) stored += capacities[i] * (result.finalC[i] - result.initialC[i]);
    const meanRise = prep.totalTimeS > 0 ? (rsa * (prep.energyJ - stored)) / prep.totalTimeS : 0;
    return { result, meanRise };
  };

  if (mode.mode === 'forced') {
    const { result, meanRise } = run(mode.rthKPerW);
    return { rsaKPerW: mode.rthKPerW, meanRiseK: meanRise, runs: 1, settled: true, ...peaks(result) };
  }

  const rating = candidate.natural!;
  const law = (rise: number) => naturalConvectionRsa(rating.rthKPerW, rating.referenceRiseK, rise, rating.exponent);
  let rsa = initialGuess(prep, candidate.capacityJPerK, law, rating);
  let runs = 0;
  for (;;) {
    const { result, meanRise } = run(rsa);
    runs++;
    const target = law(meanRise);
    const settled = Math.abs(target / rsa - 1) <= CONVECTION_REL_TOL || prep.totalTimeS === 0;
    if (settled || runs >= MAX_CONVECTION_RUNS) return { rsaKPerW: rsa, meanRiseK: meanRise, runs, settled, ...peaks(result) };
    const n = rating.exponent;
    rsa = Math.exp((Math.log(target) + n * Math.log(rsa)) / (1 + n));
  }
}

function peaks(result: ReturnType<typeof scanPeaks>) {
  return { peakC: result.peakC, peakTimeS: result.peakTimeS, interiorSearches: result.interiorSearches };
}

/** Rθsa at the mean rise of a single RC under the mean power (exact mean when periodic). */
function initialGuess(
  prep: PreparedRanking,
  sinkCapacity: number,
  law: (rise: number) => number,
  rating: { rthKPerW: number; referenceRiseK: number; exponent: number },
): number {
  const steady = naturalConvectionSteady(rating.rthKPerW, rating.referenceRiseK, prep.meanPowerW, rating.exponent).rsaKPerW;
  if (prep.periodic || prep.totalTimeS === 0) return steady;
  const T = prep.totalTimeS;
  const C = sinkCapacity + prep.deviceCapacityJPerK;
  let rsa = steady;
  for (let i = 0; i < 20; i++) {
    const tau = rsa * C;
    // Mean over [0, T] of R P (1 − e^(−t/τ)).
    const fraction = tau > 0 ? 1 + (tau / T) * Math.expm1(-T / tau) : 1;
    rsa = law(rsa * prep.meanPowerW * fraction);
  }
  return rsa;
}
