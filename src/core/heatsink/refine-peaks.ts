import { peakInSegment, temperaturesFromModal, type ModalModel } from '../thermal';
import { PEAK_TOLERANCE_K } from './constants';
import { interiorMaximum } from './interior-maximum';
import type { ScanProfile } from './scan-profile';
import type { ScanWorkspace } from './scan-workspace';

/**
 * Searches the interiors of the segments scanPeaks set aside, for each watched node: the one
 * with the highest bound first, then every other whose bound still exceeds the best peak by
 * more than PEAK_TOLERANCE_K. Raises peakC / peakTimeS in place; returns how many segments
 * were searched.
 */
export function refinePeaks(
  model: ModalModel,
  profile: ScanProfile,
  watch: Int32Array,
  ws: ScanWorkspace,
  counts: Int32Array,
  peakC: Float64Array,
  peakTimeS: Float64Array,
): number {
  const { modeCount: n, nodeCount: N, inputCount: q, rates, outputFromModes: W, steadyFromInputs: K, modesFromInputs: F } = model;
  const { durations, inputs, durationIndex } = profile;
  const S = durations.length;
  const { decay, snapshots, candidateSegment, candidateBound, candidateTime } = ws;
  const tol = PEAK_TOLERANCE_K;
  const Wrow = new Float64Array(n);
  const d = new Float64Array(n);
  const found = new Float64Array(2);
  const temps = new Float64Array(N);
  let searches = 0;

  for (let w = 0; w < watch.length; w++) {
    const count = counts[w];
    if (count === 0) continue;
    const node = watch[w];
    for (let k = 0; k < n; k++) Wrow[k] = W[node * n + k];
    const first = w * S;
    let top = first;
    for (let c = first + 1; c < first + count; c++) if (candidateBound[c] > candidateBound[top]) top = c;

    const search = (c: number): void => {
      const s = candidateSegment[c];
      const h = durations[s];
      const row = s * q;
      const u = inputs.subarray(row, row + q);
      const x = snapshots.subarray(s * n, s * n + n);
      let a0 = 0;
      for (let j = 0; j < q; j++) a0 += K[node * q + j] * u[j];
      for (let k = 0; k < n; k++) {
        let xInf = 0;
        for (let j = 0; j < q; j++) xInf += F[k * q + j] * u[j];
        d[k] = x[k] - xInf;
      }
      searches++;
      const kind = interiorMaximum(rates, Wrow, 0, d, decay, durationIndex[s] * n, a0, h, found);
      if (kind === 'none') return;
      if (kind === 'unknown') {
        temperaturesFromModal(model, x, u, temps);
        const p = peakInSegment(model, temps, u, h, node);
        found[0] = p.valueC;
        found[1] = p.timeS;
      }
      if (found[0] > peakC[w]) {
        peakC[w] = found[0];
        peakTimeS[w] = candidateTime[c] + found[1];
      }
    };

    search(top);
    for (let c = first; c < first + count; c++) {
      if (c !== top && candidateBound[c] > peakC[w] + tol) search(c);
    }
  }
  return searches;
}
