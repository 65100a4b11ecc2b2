import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import type { Heatsink } from './types';

export const formatRth = (h: Pick<Heatsink, 'rthKPerW' | 'referenceRiseK'>) =>
  `${formatQuantity(h.rthKPerW, 'K/W')} at ${formatQuantity(h.referenceRiseK, 'K')} rise`;

/** The still-air rise exponent n: "0.33", or "1/4 (default)" when the catalogue gives none. */
export const formatExponent = (n: number | null) => (n === null ? '1/4 (default)' : formatNumber(n));

/** "1 m/s 0.62 · 2 m/s 0.46 K/W", or "—" in still air only. */
export function formatForcedAir(points: Heatsink['forcedAir']): string {
  if (points.length === 0) return '—';
  const sorted = [...points].sort((a, b) => a.airSpeedMPerS - b.airSpeedMPerS);
  return `${sorted.map((p) => `${formatQuantity(p.airSpeedMPerS, 'm/s')} ${formatNumber(p.rthKPerW)}`).join(' · ')}\u00a0K/W`;
}

/** Grams below a kilogram, kilograms above. */
export function formatMass(kg: number | null): string {
  if (kg === null) return '—';
  return kg < 1 ? formatQuantity(kg * 1000, 'g') : formatQuantity(kg, 'kg');
}

/** "42 × 50 × 25 mm" (width × length × height); missing dimensions as "?". */
export function formatSize(h: Pick<Heatsink, 'widthMm' | 'lengthMm' | 'heightMm'>): string {
  const dims = [h.widthMm, h.lengthMm, h.heightMm];
  if (dims.every((d) => d === null)) return '—';
  return `${dims.map((d) => (d === null ? '?' : formatNumber(d))).join(' × ')}\u00a0mm`;
}

/** Price in the team's currency (the catalogue does not name one), two decimals. */
export const formatPrice = (price: number | null) => (price === null ? '—' : price.toFixed(2));
