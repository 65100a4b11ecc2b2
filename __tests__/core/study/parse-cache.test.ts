import { createParseCache, parseStudy } from '@/core/study';
import { twoDeviceStudy } from './study-fixtures';

type Doc = Record<string, any>;

const study = (): Doc => {
  const doc = twoDeviceStudy();
  doc.profile.segments = Array.from({ length: 50 }, (_, i) => ({ durationS: 0.5 + (i % 3), powerW: { Q1: 10 + i, Q2: 3 } }));
  return doc;
};

const thrown = (f: () => unknown): string => {
  try {
    f();
  } catch (e) {
    return (e as Error).message;
  }
  return 'nothing thrown';
};

// Reference: the parser without a cache; a cached parse must give the same document or the same error.
describe('parseStudy with a parse cache', () => {
  it('reuses the parsed profile of the same raw profile object and matches the uncached parse', () => {
    const cache = createParseCache();
    const raw = study();
    const first = parseStudy(raw, cache);
    const edited = { ...raw, ambient: { temperatureC: 55 } };
    const second = parseStudy(edited, cache);
    expect(second.profile).toBe(first.profile);
    expect(second).toEqual(parseStudy(edited));
    // A new profile object is parsed again.
    const changed = { ...raw, profile: { ...raw.profile, segments: raw.profile.segments.slice(0, 10) } };
    const third = parseStudy(changed, cache);
    expect(third.profile).not.toBe(first.profile);
    expect(third).toEqual(parseStudy(changed));
  });

  it('parses the profile again when the devices it refers to change', () => {
    const cache = createParseCache();
    const raw = study();
    parseStudy(raw, cache);
    const renamed = { ...raw, devices: raw.devices.map((d: Doc) => (d.id === 'Q2' ? { ...d, id: 'Q9' } : d)) };
    const message = thrown(() => parseStudy(renamed, cache));
    expect(message).toBe(thrown(() => parseStudy(renamed)));
    expect(message).toMatch(/^profile\.segments\[0\]\.powerW\.Q2: no device has the id "Q2"/);
  });

  it('still finds a non-finite value outside a known profile', () => {
    const cache = createParseCache();
    const raw = study();
    parseStudy(raw, cache);
    const bad = { ...raw, ambient: { temperatureC: Number.NaN } };
    expect(thrown(() => parseStudy(bad, cache))).toBe(thrown(() => parseStudy(bad)));
    expect(thrown(() => parseStudy(bad, cache))).toMatch(/^ambient\.temperatureC: must be a finite number/);
  });

  it('reads only the edited items of a new profile array, with the uncached parse’s document and errors', () => {
    const cache = createParseCache();
    const raw = study();
    raw.profile.segments.push({ repeat: 3, segments: [{ durationS: 1, powerW: { Q1: 4 } }, { durationS: 2, powerW: { Q2: 1 } }] });
    const first = parseStudy(raw, cache);
    // One step edited, one inserted: a new array of mostly the same item objects.
    const segments = raw.profile.segments.slice();
    segments[7] = { ...segments[7], powerW: { Q1: 99, Q2: 3 } };
    segments.splice(20, 0, { durationS: 4, powerW: { Q2: 8 } });
    const edited = { ...raw, profile: { ...raw.profile, segments } };
    const second = parseStudy(edited, cache);
    expect(second).toEqual(parseStudy(edited));
    // Unedited steps are the very objects parsed before (so later caches keyed by them hold).
    expect(second.profile.segments[6]).toBe(first.profile.segments[6]);
    expect(second.profile.segments[7]).not.toBe(first.profile.segments[7]);
    expect(second.profile.segments[7].powerW.Q1).toBe(99);
    expect(second.profile.segments.length).toBe(first.profile.segments.length + 1);
    // A bad edit names its own index, as without the cache.
    const bad = { ...raw, profile: { ...raw.profile, segments: segments.map((x: Doc, i: number) => (i === 33 ? { ...x, durationS: -1 } : x)) } };
    const message = thrown(() => parseStudy(bad, cache));
    expect(message).toBe(thrown(() => parseStudy(bad)));
    expect(message).toMatch(/^profile\.segments\[33\]\.durationS: /);
    // A non-finite number in a new item, or outside the profile, is found where the uncached parse finds it.
    for (const broken of [
      { ...raw, profile: { ...raw.profile, segments: segments.map((x: Doc, i: number) => (i === 41 ? { ...x, durationS: Number.POSITIVE_INFINITY } : x)) } },
      { ...edited, marginK: Number.NaN },
    ]) {
      expect(thrown(() => parseStudy(broken, cache))).toBe(thrown(() => parseStudy(broken)));
    }
    expect(thrown(() => parseStudy({ ...edited, marginK: Number.NaN }, cache))).toMatch(/^marginK: must be a finite number/);
    // Known items under other devices are read again: the device they name is gone.
    const renamed = { ...edited, devices: raw.devices.map((d: Doc) => (d.id === 'Q2' ? { ...d, id: 'Q9' } : d)) };
    expect(thrown(() => parseStudy(renamed, cache))).toBe(thrown(() => parseStudy(renamed)));
  });
});
