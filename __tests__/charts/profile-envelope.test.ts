import { liveEditDocument } from '@/cli/bench-live';
import { profileEnvelope, type ProfileStepValue } from '@/charts/profile-envelope';

/** The load current of the 10,000-segment live-edit profile (demo data), as steps one after the other. */
function rawSteps(): ProfileStepValue[] {
  const segments = (liveEditDocument() as { profile: { segments: { durationS: number; iloadA: number }[] } }).profile.segments;
  let t = 0;
  return segments.map((s) => {
    const step = { startS: t, endS: t + s.durationS, value: s.iloadA };
    t += s.durationS;
    return step;
  });
}

// Min/max decimation ("peak detect", as digital oscilloscopes draw long records on a few
// hundred pixels) keeps each interval's extremes: common practice. The reference here is a
// brute-force pass over the raw segments.
describe('profile envelope', () => {
  const steps = rawSteps();
  const durationS = steps[steps.length - 1].endS;
  const env = profileEnvelope(steps, durationS, 600);

  it('draws 10,000 segments as at most one bucket per pixel, covering the whole pass', () => {
    expect(steps).toHaveLength(10_000);
    expect(env.length).toBeLessThanOrEqual(600);
    expect(env[0].startS).toBe(0);
    expect(env[env.length - 1].endS).toBeCloseTo(durationS, 9);
  });

  it('gives each bucket the highest and lowest value of the raw segments overlapping it', () => {
    for (const b of env) {
      const inside = steps.filter((s) => s.startS < b.endS && s.endS > b.startS).map((s) => s.value);
      expect(b.max).toBe(Math.max(...inside));
      expect(b.min).toBe(Math.min(...inside));
    }
  });

  it('keeps every segment inside the band of the buckets it spans', () => {
    for (const s of steps) {
      const over = env.filter((b) => s.startS < b.endS && s.endS > b.startS);
      expect(over.length).toBeGreaterThan(0);
      for (const b of over) {
        expect(b.max).toBeGreaterThanOrEqual(s.value);
        expect(b.min).toBeLessThanOrEqual(s.value);
      }
    }
    expect(Math.max(...env.map((b) => b.max))).toBe(Math.max(...steps.map((s) => s.value)));
  });

  it('does not let a step ending on a bucket edge reach into the next bucket', () => {
    // Two steps of 1 s over 2 s in two buckets: each bucket holds exactly one value.
    const two = profileEnvelope([{ startS: 0, endS: 1, value: 5 }, { startS: 1, endS: 2, value: 1 }], 2, 2);
    expect(two).toEqual([{ startS: 0, endS: 1, min: 5, max: 5 }, { startS: 1, endS: 2, min: 1, max: 1 }]);
  });
});
