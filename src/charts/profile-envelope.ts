/** One constant stretch of a profile: a value held from startS to endS. */
export type ProfileStepValue = { startS: number; endS: number; value: number };

/** Lowest and highest value held over one stretch of the time axis. */
export type EnvelopeBucket = { startS: number; endS: number; min: number; max: number };

/**
 * The profile cut into `buckets` equal stretches of [0, durationS], each with the lowest and
 * highest value of every step that overlaps it (zero-length steps count at their instant).
 * A chart a few hundred pixels wide draws one bucket per pixel instead of thousands of steps,
 * and still shows every step's peak and trough. Buckets no step reaches are left out.
 */
export function profileEnvelope(steps: readonly ProfileStepValue[], durationS: number, buckets: number): EnvelopeBucket[] {
  const n = Math.max(1, Math.floor(buckets));
  if (!(durationS > 0)) return [];
  const width = durationS / n;
  const min = new Float64Array(n).fill(Infinity);
  const max = new Float64Array(n).fill(-Infinity);
  const bucketOf = (t: number) => Math.min(n - 1, Math.max(0, Math.floor(t / width)));
  for (const step of steps) {
    const first = bucketOf(step.startS);
    let last = step.endS > step.startS ? bucketOf(step.endS) : first;
    // A step ending exactly on a bucket's start does not reach into that bucket.
    if (last > first && last * width >= step.endS) last--;
    for (let k = first; k <= last; k++) {
      if (step.value < min[k]) min[k] = step.value;
      if (step.value > max[k]) max[k] = step.value;
    }
  }
  const out: EnvelopeBucket[] = [];
  for (let k = 0; k < n; k++) {
    if (max[k] === -Infinity) continue;
    out.push({ startS: k * width, endS: k === n - 1 ? durationS : (k + 1) * width, min: min[k], max: max[k] });
  }
  return out;
}
