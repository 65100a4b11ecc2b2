import { isElectrical, isGroup, type Num, type RawItem, type RawProfile } from './types';

/** One constant stretch of one pass, as drawn: current of an operating point, or power per part. */
export type ProfileStep = { startS: number; endS: number; currentA: number | null; powerW: Record<string, number> };

export type ProfileSteps = {
  steps: ProfileStep[];
  /** Segments in one pass after groups are expanded (counted past the drawing cap). */
  segmentCount: number;
  passS: number;
  /** Some durations or repeats are not numbers yet: they count as zero (or once). */
  incomplete: boolean;
  /** The drawing stopped at MAX_DRAWN_STEPS. */
  truncated: boolean;
};

/** Steps kept for the chart at most (it draws more than a few hundred as a per-pixel band). */
export const MAX_DRAWN_STEPS = 100_000;
const MAX_COUNTED = 10_000_000;

const num = (v: Num | undefined): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);

/** Expands groups of the edited profile without checking it, for the chart and the summary line. */
export function profileSteps(profile: RawProfile | undefined): ProfileSteps {
  const out: ProfileSteps = { steps: [], segmentCount: 0, passS: 0, incomplete: false, truncated: false };

  // Counts and durations of a list of items without drawing them (for repeats past the cap).
  const measure = (items: readonly RawItem[]): { count: number; durationS: number } => {
    let count = 0;
    let durationS = 0;
    for (const item of items) {
      if (isGroup(item)) {
        const inner = measure(item.segments ?? []);
        const repeat = Math.max(1, Math.floor(num(item.repeat) ?? 1));
        count += inner.count * repeat;
        durationS += inner.durationS * repeat;
      } else {
        count += 1;
        durationS += Math.max(0, num(item.durationS) ?? 0);
      }
    }
    return { count, durationS };
  };

  const walk = (items: readonly RawItem[], depth: number) => {
    for (const item of items) {
      if (out.segmentCount > MAX_COUNTED) return;
      if (isGroup(item)) {
        const repeat = num(item.repeat);
        if (repeat === null) out.incomplete = true;
        const times = Math.max(1, Math.floor(repeat ?? 1));
        for (let r = 0; r < times; r++) {
          if (out.truncated || depth > 8) {
            const rest = measure(item.segments ?? []);
            out.segmentCount += rest.count * (times - r);
            out.passS += rest.durationS * (times - r);
            break;
          }
          walk(item.segments ?? [], depth + 1);
        }
        continue;
      }
      const durationS = num(item.durationS);
      if (durationS === null) out.incomplete = true;
      const d = Math.max(0, durationS ?? 0);
      out.segmentCount += 1;
      if (!out.truncated) {
        const powerW: Record<string, number> = {};
        for (const [id, w] of Object.entries(item.powerW ?? {})) {
          const value = num(w);
          if (value !== null) powerW[id] = value;
        }
        out.steps.push({ startS: out.passS, endS: out.passS + d, currentA: isElectrical(item) ? num(item.iloadA) : null, powerW });
        if (out.steps.length >= MAX_DRAWN_STEPS) out.truncated = true;
      }
      out.passS += d;
    }
  };
  walk(profile?.segments ?? [], 0);
  return out;
}
