import type { SoaCheck, SoaOperatingPoint, SoaParameters } from '@/core/soa';
import { MAX_TRACKED_SOA_POINTS } from '@/core/study/constants';
import { createSoaAccumulator, durationKey, type MergedPoint, type SoaStretch } from '@/core/study/soa-accumulator';
import { seededRandom } from '../../helpers/seeded-random';

// Demo part (invented): the same construction as soa-check.test.ts (PHYSICS.md §4).
const model: SoaParameters = {
  kind: 'parameters',
  transistor: 'bipolar',
  tjMaxC: 150,
  icMaxA: 15,
  vceoV: 100,
  rthJcKPerW: 1.5,
  secondBreakdown: { referenceVceV: 60, referenceIcA: 1.2, exponent: 2, derating: { kind: 'linear', fractionPerK: 0.005 } },
};

/**
 * The merging rule written out plainly, as a check on the accumulator's hashed table: one
 * point per (Vce, Ic, duration to 12 digits) under Map key equality, the hottest stretch's
 * time and case temperature kept, points in the order first met, and past
 * MAX_TRACKED_SOA_POINTS the lower-margin half kept.
 */
function plainMerge(stretches: SoaStretch[], check: (p: SoaOperatingPoint[]) => SoaCheck) {
  const index = new Map<string, MergedPoint>();
  const keyOf = (s: SoaStretch) => JSON.stringify([s.vceV === 0 ? 0 : s.vceV, s.icA === 0 ? 0 : s.icA, durationKey(s.durationS)]);
  let droppedPoints = 0;
  for (const s of stretches) {
    const m = index.get(keyOf(s));
    if (m) {
      m.occurrences++;
      m.firstTimeS = Math.min(m.firstTimeS, s.timeS);
      if (s.caseC > m.caseC) Object.assign(m, { caseC: s.caseC, timeS: s.timeS });
      continue;
    }
    index.set(keyOf(s), { ...s, occurrences: 1, firstTimeS: s.timeS });
    if (index.size > MAX_TRACKED_SOA_POINTS) {
      const entries = [...index.values()];
      const result = check(entries);
      const order = entries.map((_, i) => i).sort((a, b) => result.margin[a] - result.margin[b] || entries[a].timeS - entries[b].timeS);
      for (const i of order.slice(Math.floor(MAX_TRACKED_SOA_POINTS / 2))) {
        index.delete(keyOf(entries[i]));
        droppedPoints++;
      }
    }
  }
  return { points: [...index.values()], droppedPoints };
}

/** Stretches drawn from a few levels so many repeat; durations summed from pieces so they differ in the last digits. */
function stretches(count: number, levels: number, seed: number): SoaStretch[] {
  const rnd = seededRandom(seed);
  const pick = (n: number) => Math.floor(rnd() * n);
  return Array.from({ length: count }, (_, i) => {
    const d = 0.5 + pick(7) * 0.3;
    const t = i * 2.5;
    return { timeS: t, durationS: t + d - t, vceV: pick(levels) === 0 ? -0 * 1 : 0.5 * pick(levels), icA: 0.1 * pick(levels), caseC: 40 + 30 * rnd() };
  });
}

describe('SOA accumulator', () => {
  test('merges stretches as the plain map of (Vce, Ic, duration) does', () => {
    const list = stretches(20_000, 40, 7);
    const acc = createSoaAccumulator(model);
    list.forEach((s) => acc.add(s));
    const plain = plainMerge(list, () => {
      throw new Error('no compression expected');
    });
    expect(acc.stretches).toBe(list.length);
    expect(acc.droppedPoints).toBe(0);
    // More than one point and fewer than stretches: the case merges.
    expect(plain.points.length).toBeGreaterThan(100);
    expect(plain.points.length).toBeLessThan(list.length);
    expect(acc.points()).toEqual(plain.points);
  });

  test('keeps the same lower-margin half as the plain map when it outgrows its bound', () => {
    // Margin = 1/Ic (a stand-in check): the points with the highest current survive.
    const check = (p: SoaOperatingPoint[]): SoaCheck => {
      const margin = Float64Array.from(p, (x) => 1 / x.icA);
      return { allowedA: new Float64Array(p.length), margin, limits: [], pulses: [], worst: null, failedCount: 0, passed: true, warnings: [] };
    };
    const list = stretches(MAX_TRACKED_SOA_POINTS * 2, 400, 11).map((s, i) => ({ ...s, icA: s.icA + 1 + (i % 5000) * 1e-3 }));
    const acc = createSoaAccumulator(model, check);
    list.forEach((s) => acc.add(s));
    const plain = plainMerge(list, check);
    expect(plain.droppedPoints).toBeGreaterThan(0);
    expect(acc.droppedPoints).toBe(plain.droppedPoints);
    expect(acc.points()).toEqual(plain.points);
  });
});
