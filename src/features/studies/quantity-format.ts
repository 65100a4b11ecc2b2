const NBSP = '\u00a0';
const SIGNIFICANT_DIGITS = 3;

/** Three significant digits without trailing zeros: 0.65, 1260, 0.0004. */
export function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return String(Number(value.toPrecision(SIGNIFICANT_DIGITS)));
}

/** A value and its unit kept on one line: "0.65 K/W". */
export function formatQuantity(value: number, unit: string): string {
  return `${formatNumber(value)}${NBSP}${unit}`;
}

/** Seconds in the unit a reader would use: "45 s", "15 min", "2.5 h". */
export function formatDuration(seconds: number): string {
  if (seconds < 120) return formatQuantity(seconds, 's');
  if (seconds < 2 * 3600) return formatQuantity(seconds / 60, 'min');
  return formatQuantity(seconds / 3600, 'h');
}

/** "2–8 A", or a single value when the range is flat. */
export function formatRange(values: readonly number[], unit: string): string {
  const low = Math.min(...values);
  const high = Math.max(...values);
  if (low === high) return formatQuantity(low, unit);
  return `${formatNumber(low)}–${formatQuantity(high, unit)}`;
}
