import { scaleLinear } from 'd3-scale';

export type TimeUnit = { symbol: 's' | 'min' | 'h'; seconds: number };

const SECOND: TimeUnit = { symbol: 's', seconds: 1 };
const MINUTE: TimeUnit = { symbol: 'min', seconds: 60 };
const HOUR: TimeUnit = { symbol: 'h', seconds: 3600 };

/** The unit a reader would use for a span: seconds below 2 min, minutes below 2 h, then hours. */
export function timeUnitFor(spanS: number): TimeUnit {
  if (!(spanS >= 0)) throw new RangeError(`spanS: must be a number ≥ 0, got ${spanS}`);
  if (spanS < 120) return SECOND;
  if (spanS < 2 * 3600) return MINUTE;
  return HOUR;
}

export type Tick = { value: number; label: string };

/**
 * Round-numbered ticks over [t0, t1] (s), labelled in the span's unit with as many decimals
 * as the tick step needs (d3's nice steps of 1, 2 and 5 × 10^k).
 */
export function timeTicks(t0: number, t1: number, count: number): { unit: TimeUnit; ticks: Tick[] } {
  const unit = timeUnitFor(Math.abs(t1 - t0));
  const scale = scaleLinear().domain([t0 / unit.seconds, t1 / unit.seconds]);
  const format = scale.tickFormat(count);
  const ticks = scale.ticks(count).map((v) => ({ value: v * unit.seconds, label: format(v) }));
  return { unit, ticks };
}

/**
 * A time read off the chart, with the precision the visible span allows: about three
 * significant digits of the span ("12.3 s" over 35 s, "2.67 min" over 3 min).
 */
export function formatTimeAt(timeS: number, spanS: number): string {
  const unit = timeUnitFor(spanS);
  const span = spanS / unit.seconds;
  const decimals = span > 0 ? Math.max(0, Math.min(6, 2 - Math.floor(Math.log10(span)))) : 0;
  return `${(timeS / unit.seconds).toFixed(decimals)}\u00a0${unit.symbol}`;
}

/** A length of time in the unit a reader would use, three significant digits: "60 s", "2.67 min". */
export function formatSpan(spanS: number): string {
  const unit = timeUnitFor(Math.abs(spanS));
  return `${Number((spanS / unit.seconds).toPrecision(3))}\u00a0${unit.symbol}`;
}
