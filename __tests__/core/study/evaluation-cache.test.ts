import fs from 'node:fs';
import path from 'node:path';

import { createEvaluationCache, createParseCache, evaluateStudy, parseStudy } from '@/core/study';

type Doc = Record<string, any>;

/** The lab-supply demo study (rail plan with two taps, SOA) over a 300-step invented log (demo data). */
function labSupply(): Doc {
  const doc = JSON.parse(fs.readFileSync(path.join(__dirname, '../../../examples/lab-supply-two-tap.json'), 'utf8')) as Doc;
  doc.profile = {
    segments: Array.from({ length: 300 }, (_, i) => ({ durationS: 0.5 + (i % 7) * 0.3, voutV: 3 + ((i * 37) % 27), iloadA: Number((0.2 + ((i * 13) % 29) / 10).toFixed(1)) })),
  };
  return doc;
}

const options = { seriesPoints: 64 };

// Reference: the same evaluation without a cache (its rail selection made afresh); a cached one must give the same result, bit for bit.
describe('evaluateStudy with an evaluation cache', () => {
  it('reuses the tap selection of the same profile across ambient and sink edits, with the uncached result', () => {
    const parses = createParseCache();
    const cache = createEvaluationCache();
    const raw = labSupply();
    const first = parseStudy(raw, parses);
    expect(evaluateStudy(first, { ...options, cache })).toEqual(evaluateStudy(first, options));
    const known = cache.rail.byProfile.get(first.profile)?.selection;
    expect(known).toBeDefined();

    for (const edit of [{ ambient: { temperatureC: 60 } }, { sinks: [{ ...raw.sinks[0], rthKPerW: 0.9 }] }, { marginK: 25 }]) {
      const doc = parseStudy({ ...raw, ...edit }, parses);
      expect(doc.profile).toBe(first.profile);
      const cached = evaluateStudy(doc, { ...options, cache });
      expect(cache.rail.byProfile.get(doc.profile)?.selection).toBe(known);
      expect(cached).toEqual(evaluateStudy(doc, options));
    }
  });

  it('selects again when the rail plan, a pass element’s electrical model or the profile changes', () => {
    const parses = createParseCache();
    const cache = createEvaluationCache();
    const raw = labSupply();
    const first = parseStudy(raw, parses);
    evaluateStudy(first, { ...options, cache });
    const known = cache.rail.byProfile.get(first.profile)!.selection;

    const thresholds = { ...raw, railPlan: { ...raw.railPlan, thresholdsV: raw.railPlan.thresholdsV.map((v: number) => v + 2) } };
    const device = { ...raw.devices[0], electrical: { ...raw.devices[0].electrical, iqA: 0.05 } };
    const iq = { ...raw, devices: [device, ...raw.devices.slice(1)] };
    const count = { ...raw, devices: [{ ...raw.devices[0], count: 3 }, ...raw.devices.slice(1)] };
    for (const edited of [thresholds, iq, count]) {
      const doc = parseStudy(edited, parses);
      const cached = evaluateStudy(doc, { ...options, cache });
      expect(cache.rail.byProfile.get(doc.profile)!.selection).not.toBe(known);
      expect(cached).toEqual(evaluateStudy(doc, options));
    }
    // A new profile object (an edited step) is a new entry of its own; the next one under the
    // same plan and members shares its tap points and resolved steps (the memo).
    const segments = raw.profile.segments.map((s: Doc, i: number) => (i === 10 ? { ...s, iloadA: 2.9 } : s));
    const doc = parseStudy({ ...raw, profile: { ...raw.profile, segments } }, parses);
    expect(evaluateStudy(doc, { ...options, cache })).toEqual(evaluateStudy(doc, options));
    expect(cache.rail.byProfile.get(doc.profile)!.selection).not.toBe(known);
    const memo = cache.rail.memo!.memo;
    // Inserted and removed steps too.
    const moved = [...segments.slice(0, 50), { durationS: 3, voutV: 20, iloadA: 2.5 }, ...segments.slice(50, 250)];
    const again = parseStudy({ ...raw, profile: { ...raw.profile, segments: moved } }, parses);
    expect(evaluateStudy(again, { ...options, cache })).toEqual(evaluateStudy(again, options));
    expect(cache.rail.memo!.memo).toBe(memo);
  });
});
