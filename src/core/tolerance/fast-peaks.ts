import { scanPeaks } from '../heatsink/peak-scan';
import type { ScanProfile } from '../heatsink/scan-profile';
import { createScanWorkspace, type ScanWorkspace } from '../heatsink/scan-workspace';
import { CONVECTION_TOLERANCE, type StudyDocument } from '../study';
import { selectRailTaps } from '../study/rail-selection';
import { siteAdjusted } from '../study/site-adjust';
import { fedDevices, segmentPower } from '../study/segment-power';
import { createStudyModel } from '../study/study-model';

/**
 * Whether a study's runs can take the peak scan: linear (no thermal shutdown, no natural
 * convection), a constant ambient, and a profile that is either run as written or, periodic,
 * one pass repeated forever (with a rail plan: one pass, not periodic). Otherwise every run
 * goes through the full pipeline.
 */
export function fastPathApplies(doc: StudyDocument): boolean {
  return (
    doc.ambient.kind === 'constant' &&
    !doc.devices.some((d) => d.electrical?.thermalShutdown) &&
    !doc.sinks.some((s) => s.naturalConvection) &&
    (!doc.profile.periodic || doc.profile.repeat === 1) &&
    // Tap selection carries its state across passes: a rail plan takes the scan for one pass only.
    (!doc.railPlan || (doc.profile.repeat === 1 && !doc.profile.periodic))
  );
}

/**
 * Peak junction temperature of every device (°C, device order) of a linear study, by the
 * heatsink ranking's peak scan (src/core/heatsink/peak-scan.ts: exact modal solution per
 * segment, peaks at most PEAK_TOLERANCE_K = 1e-4 K below the exact ones) on the study's own
 * network (at the site's altitude), with each segment's dissipation from the same electrical
 * model and rail-tap selection the pipeline uses. About a hundred times cheaper than evaluateStudy per run,
 * which also records events, time above target and the SOA.
 */
/** One workspace per thread, reused from run to run (a scan never yields mid-way). */
const shared = createScanWorkspace();

export function fastPeaks(written: StudyDocument, ws: ScanWorkspace = shared): Float64Array {
  // The same steps as evaluateStudy: Rθsa at the site's altitude, then the taps.
  const atSite = siteAdjusted(written)?.doc ?? written;
  const doc = atSite.railPlan ? selectRailTaps(atSite).doc : atSite;
  const sm = createStudyModel(doc, CONVECTION_TOLERANCE);
  const m = doc.devices.length;
  const q = m + 1;
  const ambientC = doc.ambient.kind === 'constant' ? doc.ambient.temperatureC : NaN;
  const passes = doc.profile.periodic ? 1 : doc.profile.repeat;
  const segments = doc.profile.segments;
  const n = segments.length;
  const S = n * passes;
  // The scan's layout built directly: one input row per segment of the pass (passes share
  // them), one entry per distinct duration. scanProfile would find the distinct rows by
  // text keys, which costs more than the scan itself here.
  const rows = new Float64Array(n * q);
  const rowOfPass = new Int32Array(n);
  const durationOfPass = new Int32Array(n);
  const lengths = new Map<number, number>();
  const distinct: number[] = [];
  const on = doc.devices.map(() => true);
  let passTimeS = 0;
  for (let s = 0; s < n; s++) {
    const segment = segments[s];
    const { partPowerW } = segmentPower(doc, segment, fedDevices(doc, segment), on);
    for (let d = 0; d < m; d++) rows[s * q + d] = partPowerW[d] * doc.devices[d].count;
    rows[s * q + m] = ambientC;
    rowOfPass[s] = s;
    let k = lengths.get(segment.durationS);
    if (k === undefined) {
      k = distinct.length;
      distinct.push(segment.durationS);
      lengths.set(segment.durationS, k);
    }
    durationOfPass[s] = k;
    passTimeS += segment.durationS;
  }
  const durations = new Float64Array(S);
  const durationIndex = new Int32Array(S);
  const rowIndex = new Int32Array(S);
  const inputs = new Float64Array(S * q);
  for (let pass = 0; pass < passes; pass++) {
    inputs.set(rows, pass * n * q);
    rowIndex.set(rowOfPass, pass * n);
    durationIndex.set(durationOfPass, pass * n);
    for (let s = 0; s < n; s++) durations[pass * n + s] = segments[s].durationS;
  }
  const scan: ScanProfile = {
    durations,
    inputs,
    inputCount: q,
    durationIndex,
    distinctDurations: Float64Array.from(distinct),
    rowIndex,
    distinctRows: rows,
    totalTimeS: passTimeS * passes,
  };
  return scanPeaks(sm.reference, scan, Int32Array.from(sm.junction), doc.profile.periodic, ws).peakC;
}
