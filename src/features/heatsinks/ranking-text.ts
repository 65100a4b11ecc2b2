import type { SortKey } from '@/core/heatsink';
import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import { formatExponent, formatMass, formatPrice } from './heatsink-format';
import type { RankedSink, RankingJson } from './ranking-types';

export const SORT_LABELS: Record<SortKey, string> = { mass: 'Mass', volume: 'Volume', price: 'Price' };
const SMALLER: Record<SortKey, string> = { mass: 'lighter', volume: 'smaller', price: 'cheaper' };
const BY: Record<SortKey, string> = { mass: 'by mass', volume: 'by volume', price: 'by price' };

/** A volume in m³ as cm³ (or litres from a litre up). */
export function formatVolume(m3: number | undefined | null): string {
  if (m3 === undefined || m3 === null) return '—';
  const cm3 = m3 * 1e6;
  return cm3 >= 1000 ? formatQuantity(cm3 / 1000, 'L') : formatQuantity(cm3, 'cm³');
}

/** The sort key's value of a sink, as the table shows it. */
export function sortValueText(key: SortKey, value: number | null): string {
  if (value === null) return 'not given';
  return key === 'mass' ? formatMass(value) : key === 'volume' ? formatVolume(value) : formatPrice(value);
}

/** The hottest junction on the sink: its peak, the device and when. */
export function hottest(sink: RankedSink): { id: string; peakC: number; peakTimeS: number } | null {
  if (sink.devices.length === 0) return null;
  return sink.devices.reduce((a, b) => (b.peakC > a.peakC ? b : a));
}

/** Rθsa the profile ran with and where it came from. */
export function rsaText(sink: RankedSink): { text: string; note?: string } {
  if (sink.rsaKPerW === undefined) return { text: '—' };
  if (sink.rsaSource === 'forced') return { text: formatQuantity(sink.rsaKPerW, 'K/W'), note: 'forced air' };
  // The still-air law's exponent n: the catalogue's, or the laminar 1/4 when it gives none.
  const e = sink.convectionExponent;
  const law = e ? `still air, n = ${formatExponent(e.given ? e.n : null)}` : 'still air';
  const note = sink.meanRiseK !== undefined ? `${law}, at a ${formatQuantity(sink.meanRiseK, 'K')} mean rise` : law;
  return { text: formatQuantity(sink.rsaKPerW, 'K/W'), note };
}

const nameOf = (s: RankedSink) => s.name ?? `#${s.id}`;

/** "Smallest passing sink by mass: X, 120 g, 4.2 K margin (peak Tj 105 °C)." */
export function smallestSentence(result: RankingJson): string {
  const s = result.smallest;
  if (!s) return result.message ?? 'No sink passes.';
  const key = result.scenario.sortBy;
  const peak = hottest(s);
  const margin = s.worstMarginK === null ? '' : `, ${formatQuantity(s.worstMarginK, 'K')} margin`;
  return `Smallest passing sink ${BY[key]}: ${nameOf(s)}, ${sortValueText(key, s.sortValue)}${margin}${peak ? ` (peak Tj ${formatQuantity(peak.peakC, '°C')})` : ''}.`;
}

/** The steady answer: the Rθsa holding every segment's power forever needs, and the sink it would pick. */
export function steadySentence(result: RankingJson): string {
  const r = result.required;
  let need: string;
  if (!r.feasible) need = `The steady answer finds no sink that can do it${r.reason ? `: ${r.reason}` : ''}.`;
  else if (r.rsaKPerW === null) need = 'The steady answer needs no sink: nothing is dissipated.';
  else {
    const air = r.enclosureRiseK ? `, with the enclosure air ${formatQuantity(r.enclosureRiseK, 'K')} above the ambient` : '';
    need = `The steady answer (every segment’s power held forever) needs Rθsa ≤ ${formatQuantity(r.rsaKPerW, 'K/W')}${r.limitingDevice ? `, set by ${r.limitingDevice}` : ''}${air}.`;
  }
  const c = result.steadyChoice;
  if (!c) return `${need} No catalogue sink meets it.`;
  return `${need} The smallest catalogue sink that meets it is ${nameOf(c)}, ${sortValueText(result.scenario.sortBy, c.sortValue)}.`;
}

/** "Thermal mass allows a sink 35 % lighter (120 g instead of 185 g)." or null when there is no gain to report. */
export function thermalMassSentence(result: RankingJson): string | null {
  const g = result.thermalMassGain;
  if (!g) return null;
  if (g.fraction <= 0.005) return 'Thermal mass gains nothing here: the steady answer already picks the smallest passing sink.';
  return `Thermal mass allows a sink ${Math.round(g.fraction * 100)} % ${SMALLER[g.key]} (${sortValueText(g.key, g.smallest)} instead of ${sortValueText(g.key, g.steady)}).`;
}

/** "Ranked at 1800 m: Rθsa × 1.12 (air pressure 0.804 of sea level)." or null at sea level (no site). */
export function siteSentence(result: RankingJson): string | null {
  const site = result.site;
  if (!site) return null;
  const radiation = site.radiationShare > 0 ? `, ${Math.round(site.radiationShare * 100)} % of each rating taken as radiation` : '';
  return `Ranked at ${formatQuantity(site.altitudeM, 'm')}: Rθsa × ${site.rsaFactor.toFixed(2)} (air pressure ${formatNumber(site.pressureRatio)} of sea level${radiation}).`;
}

/** "The sink sheds into the enclosure air, simulated with it: 3.9 K/W to the room, …" or null when it leads straight to the ambient. */
export function enclosureSentence(result: RankingJson): string | null {
  const e = result.enclosure;
  if (!e) return null;
  const capacity = e.capacityJPerK > 0 ? `, ${formatQuantity(e.capacityJPerK, 'J/K')} of air and walls` : ', no heat capacity given';
  return `The sink sheds into the enclosure air, simulated with it: ${formatQuantity(e.rthKPerW, 'K/W')} to the room${capacity}. Each sink’s mean rise is its rise above that air.`;
}
