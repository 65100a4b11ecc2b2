import fs from 'node:fs';
import path from 'node:path';

import { createEvaluationCache, createParseCache, evaluateStudy, INTERACTIVE_MAX_STRETCHES, parseStudy } from '../core/study';

/** Segments of the live-edit case: a long logged profile in the editor. */
export const LIVE_SEGMENTS = 10_000;
/** Chart points the editor's results ask for (the verdict asks for none). */
const LIVE_SERIES_POINTS = 2000;

/**
 * The lab-supply demo study (rail plan with two taps, SOA of its bipolar pass pair) with its
 * profile replaced by LIVE_SEGMENTS invented electrical steps (demo data): the document the
 * editor solves again after each edit.
 */
export function liveEditDocument(segments = LIVE_SEGMENTS): Record<string, unknown> {
  const file = path.resolve(__dirname, '..', '..', 'examples', 'lab-supply-two-tap.json');
  const doc = JSON.parse(fs.readFileSync(file, 'utf8')) as Record<string, unknown>;
  const list = Array.from({ length: segments }, (_, i) => ({
    durationS: 0.5 + (i % 7) * 0.3,
    voutV: 3 + ((i * 37) % 27),
    iloadA: Number((0.2 + ((i * 13) % 29) / 10).toFixed(1)),
  }));
  return { ...doc, title: `Lab supply, ${segments.toLocaleString('en')}-step log (demo data)`, profile: { segments: list } };
}

/**
 * `verdictMs`: the verdict as the editor solves it (SOA at the peak case temperature), from
 * scratch; `editVerdictMs`: the same after an ambient edit, as the editor's worker solves it
 * (parse cache and evaluation cache kept from the solve before); `withSoaMs`: SOA per
 * stretch, as the full results.
 */
export type LiveEditTimes = { segments: number; verdictMs: number; editVerdictMs: number; withSoaMs: number; withoutSoaMs: number; parseMs: number; withSeriesMs: number };

const best = (runs: number, f: () => void): number => {
  let min = Infinity;
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    f();
    min = Math.min(min, performance.now() - t0);
  }
  return min;
};

/** Best-of-5 times of parse + evaluate as the editor runs them (the verdict line, then the results with chart series). */
export function benchLiveEdit(): LiveEditTimes {
  const raw = liveEditDocument();
  const doc = parseStudy(raw);
  const devices = (raw.devices as Record<string, unknown>[]).map(({ soa: _soa, ...d }) => d);
  const withoutSoa = parseStudy({ ...raw, devices });
  const options = { maxStretches: INTERACTIVE_MAX_STRETCHES };
  evaluateStudy(doc, { ...options, seriesPoints: 0 }); // warm-up
  const parses = createParseCache();
  const cache = createEvaluationCache();
  const verdict = { ...options, seriesPoints: 0, soaCaseTemperature: 'peak' as const, cache };
  evaluateStudy(parseStudy(raw, parses), verdict);
  let edit = 0;
  const ambient = raw.ambient as Record<string, unknown>;
  return {
    editVerdictMs: best(5, () => evaluateStudy(parseStudy({ ...raw, ambient: { ...ambient, temperatureC: 35 + (++edit % 2) } }, parses), verdict)),
    segments: LIVE_SEGMENTS,
    parseMs: best(5, () => parseStudy(raw)),
    verdictMs: best(5, () => evaluateStudy(doc, { ...options, seriesPoints: 0, soaCaseTemperature: 'peak' })),
    withSoaMs: best(5, () => evaluateStudy(doc, { ...options, seriesPoints: 0 })),
    withoutSoaMs: best(5, () => evaluateStudy(withoutSoa, { ...options, seriesPoints: 0 })),
    withSeriesMs: best(5, () => evaluateStudy(doc, { ...options, seriesPoints: LIVE_SERIES_POINTS })),
  };
}
