import { scaleLinear } from 'd3-scale';

import type { Tick } from './time-axis';

/** A flat curve still gets an axis this tall (K), centred on its value. */
export const MIN_TEMPERATURE_SPAN_K = 4;

/**
 * The vertical domain (°C) for the given extremes: widened to at least
 * MIN_TEMPERATURE_SPAN_K, then extended to round tick values.
 */
export function temperatureDomain(minC: number, maxC: number, count: number): [number, number] {
  if (!Number.isFinite(minC) || !Number.isFinite(maxC)) return [0, 100];
  let low = Math.min(minC, maxC);
  let high = Math.max(minC, maxC);
  if (high - low < MIN_TEMPERATURE_SPAN_K) {
    const middle = (low + high) / 2;
    low = middle - MIN_TEMPERATURE_SPAN_K / 2;
    high = middle + MIN_TEMPERATURE_SPAN_K / 2;
  }
  const [a, b] = scaleLinear().domain([low, high]).nice(count).domain();
  return [a, b];
}

export function temperatureTicks(domain: [number, number], count: number): Tick[] {
  const scale = scaleLinear().domain(domain);
  const format = scale.tickFormat(count);
  return scale.ticks(count).map((value) => ({ value, label: format(value) }));
}

/** A temperature read off the chart: one decimal, °C. */
export function formatTemperature(valueC: number): string {
  return `${valueC.toFixed(1)}\u00a0°C`;
}
