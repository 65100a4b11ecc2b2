import { scaleLog, type ScaleLogarithmic } from 'd3-scale';

/** One mark on a logarithmic axis: every 1…9 × 10^k inside the domain, labelled or not. */
export type LogTick = { value: number; decade: boolean; labelled: boolean };

/** Below this many pixels per decade only the decades carry labels; above it 2 and 5 do too. */
export const LOG_LABEL_2_5_PX = 150;

const MANTISSAS = [1, 2, 5];

/** m × 10^k without binary noise (0.3 rather than 0.30000000000000004). */
const exact = (m: number, k: number) => Number((m * 10 ** k).toPrecision(12));

function checkPositive(value: number, name: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw new RangeError(`${name}: must be a finite number above 0, got ${value}`);
}

/** The largest 1, 2 or 5 × 10^k at or below v. */
export function niceBelow(v: number): number {
  checkPositive(v, 'v');
  const k = Math.floor(Math.log10(v));
  for (let i = MANTISSAS.length - 1; i >= 0; i--) {
    const candidate = exact(MANTISSAS[i], k);
    if (candidate <= v * (1 + 1e-12)) return candidate;
  }
  return exact(5, k - 1);
}

/** The smallest 1, 2 or 5 × 10^k at or above v. */
export function niceAbove(v: number): number {
  checkPositive(v, 'v');
  const k = Math.floor(Math.log10(v));
  for (const m of [...MANTISSAS, 10]) {
    const candidate = exact(m, k);
    if (candidate >= v * (1 - 1e-12)) return candidate;
  }
  return exact(1, k + 1);
}

/**
 * A log domain around the values' extent, widened to round ends (1, 2 or 5 × 10^k). A single
 * value gets a decade around it, so a flat curve still has an axis.
 */
export function logDomain(min: number, max: number): [number, number] {
  checkPositive(min, 'min');
  checkPositive(max, 'max');
  let lo = Math.min(min, max);
  let hi = Math.max(min, max);
  if (hi / lo < 1.5) {
    const middle = Math.sqrt(lo * hi);
    lo = middle / Math.sqrt(10);
    hi = middle * Math.sqrt(10);
  }
  return [niceBelow(lo), niceAbove(hi)];
}

/**
 * Every 1…9 × 10^k inside the domain (the minor grid of log paper). Decades are labelled
 * (every second or third one when a decade is narrower than minLabelPx); 2 and 5 as well once
 * a decade is at least label25Px long, or when the domain holds fewer than two decades
 * (so that an axis always reads at two marks or more).
 */
export function logTicks(domain: readonly [number, number], lengthPx: number, minLabelPx = 44, label25Px = LOG_LABEL_2_5_PX): LogTick[] {
  const [lo, hi] = [Math.min(...domain), Math.max(...domain)];
  checkPositive(lo, 'domain[0]');
  checkPositive(hi, 'domain[1]');
  const perDecadePx = lengthPx / Math.max(Math.log10(hi / lo), 1e-9);
  const every = Math.max(1, Math.ceil(minLabelPx / perDecadePx));
  const inside = (v: number) => v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9);
  const ticks: LogTick[] = [];
  for (let k = Math.floor(Math.log10(lo)); k <= Math.ceil(Math.log10(hi)); k++) {
    for (let m = 1; m <= 9; m++) {
      const value = exact(m, k);
      const labelled = m === 1 ? ((k % every) + every) % every === 0 : (m === 2 || m === 5) && perDecadePx >= label25Px;
      if (inside(value)) ticks.push({ value, decade: m === 1, labelled });
    }
  }
  if (ticks.filter((t) => t.labelled).length < 2) {
    for (const t of ticks) if (MANTISSAS.includes(leading(t.value))) t.labelled = true;
  }
  if (ticks.filter((t) => t.labelled).length < 2) for (const t of ticks) t.labelled = true;
  return ticks;
}

/** The leading digit of a tick value (m of m × 10^k). */
function leading(v: number): number {
  return Math.round(v / 10 ** Math.floor(Math.log10(v) + 1e-12));
}

/** A d3 log scale over the domain onto [from, to] px. */
export function logScale(domain: readonly [number, number], range: readonly [number, number]): ScaleLogarithmic<number, number> {
  return scaleLog().domain([domain[0], domain[1]]).range([range[0], range[1]]);
}

/** A tick value as a plain decimal ("0.02", "5", "200"); powers beyond 10^±5 as "1e-6". */
export function formatLogValue(v: number): string {
  if (v === 0) return '0';
  const k = Math.floor(Math.log10(Math.abs(v)) + 1e-12);
  if (k < -5 || k > 5) return `${Number((v / 10 ** k).toPrecision(3))}e${k}`;
  return String(Number(v.toPrecision(6)));
}

const TIME_PREFIXES = [
  { factor: 1, symbol: 's' },
  { factor: 1e-3, symbol: 'ms' },
  { factor: 1e-6, symbol: 'µs' },
  { factor: 1e-9, symbol: 'ns' },
];

/** A time tick with an SI prefix that keeps the number at 1 or more: "100 µs", "2 ms", "10 s". */
export function formatTimeTick(seconds: number): string {
  const unit = TIME_PREFIXES.find((u) => Math.abs(seconds) >= u.factor * (1 - 1e-9)) ?? TIME_PREFIXES[TIME_PREFIXES.length - 1];
  return `${Number((seconds / unit.factor).toPrecision(6))}\u00a0${unit.symbol}`;
}

/** n times spread evenly in log between t0 and t1 (both included). */
export function logSpaced(t0: number, t1: number, n: number): number[] {
  checkPositive(t0, 't0');
  checkPositive(t1, 't1');
  if (!(Number.isInteger(n) && n >= 2)) throw new RangeError(`n: must be a whole number of 2 or more, got ${n}`);
  const a = Math.log(t0);
  const step = (Math.log(t1) - a) / (n - 1);
  return Array.from({ length: n }, (_, i) => (i === n - 1 ? t1 : i === 0 ? t0 : Math.exp(a + step * i)));
}

/** A value read off a chart: three significant digits ("7.62", "0.0513", "140"). */
export const formatReading = (v: number): string => String(Number(v.toPrecision(3)));
