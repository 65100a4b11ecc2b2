import type { CycleClass, DeviceLifetime, LifetimeResult, SiteResult, SinkTouchResult, TouchResult } from '@/core/study';
import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

/** Two significant digits: a life estimate is not known better than that. */
const rough = (v: number) => Number(v.toPrecision(2)).toLocaleString('en');

/** Life in the unit a reader would use: "51 years", "7 months", "12 days"; null: no damaging cycle. */
export function lifeText(years: number | null): string {
  if (years === null) return 'no damaging temperature cycles';
  if (years >= 1) return `${rough(years)} year${rough(years) === '1' ? '' : 's'}`;
  const months = years * 12;
  if (months >= 1) return `${rough(months)} month${rough(months) === '1' ? '' : 's'}`;
  return `${rough(years * 365.25)} days`;
}

/** A cycle count with thousands grouped: "2,500,000". */
export function cyclesText(n: number): string {
  return Number(n.toPrecision(3)).toLocaleString('en');
}

/** "8 h a day (2,880 repeats of the 10 s period)". */
export function missionText(life: LifetimeResult): string {
  const what = life.counted === 'period' ? `the ${formatQuantity(life.countedS, 's')} period` : `the ${formatQuantity(life.countedS, 's')} run`;
  const repeats = `${formatNumber(life.repeatsPerDay)} repeat${life.repeatsPerDay === 1 ? '' : 's'} of ${what} a day`;
  return life.mission.kind === 'hours' ? `${formatQuantity(life.mission.hoursPerDay, 'h')} a day (${repeats})` : `${repeats} (${formatQuantity(life.hoursPerDay, 'h')})`;
}

/** "ΔTj 15 K about 157 °C". */
export function cycleClassText(c: CycleClass): string {
  return `ΔTj ${formatQuantity(c.rangeK, 'K')} about ${formatQuantity(c.meanC, '°C')}`;
}

/** One sentence for the device: its life under the mission, or that nothing is counted. */
export function deviceLifeSentence(d: DeviceLifetime): string {
  if (d.lifeYears === null) return `${d.device}: ${lifeText(null)} in the counted history.`;
  return `${d.device}: about ${lifeText(d.lifeYears)} to the end of its power-cycling life (${formatNumber(d.cycles)} cycles per repeat, largest ΔTj ${formatQuantity(d.largestRangeK, 'K')}).`;
}

/** The law and where its numbers come from. */
export function modelText(life: LifetimeResult): string {
  const m = life.model;
  return `Nf = A·ΔTj^−α·exp(Ea/(kB·Tjm)) with A = ${formatNumber(m.coefficient)}, α = ${formatNumber(m.exponent)}, Ea = ${formatQuantity(m.activationEnergyEV, 'eV')}; damage summed by the Palmgren–Miner rule over rainflow cycles (ASTM E1049).`;
}

/** The site line of the assumptions. */
export function siteText(site: SiteResult): string {
  const factors = Object.entries(site.sinks).map(([id, s]) => `${id} ×${formatNumber(s.factor)} (${s.law === 'forced' ? 'forced air, h ∝ ρ^0.5' : `natural convection, h ∝ ρ^${formatNumber(2 * s.exponent)}`})`);
  const enclosure = site.enclosure ? `, enclosure ×${formatNumber(site.enclosure.factor)}` : '';
  return `Site at ${formatQuantity(site.altitudeM, 'm')}: air pressure ${formatNumber(site.pressureRatio)} of sea level (standard atmosphere); Rθsa raised: ${factors.join(', ')}${enclosure}.`;
}

const CONTACT_WORDS = { brief: 'brief contact (up to 10 s)', short: 'short contact (up to 1 min)', long: 'long contact (up to 8 h)', continuous: 'continuous contact' } as const;

/** Where a sink's touch limit comes from. */
export function touchRuleText(s: SinkTouchResult): string {
  if (s.material && s.contact) return `${s.material}, ${CONTACT_WORDS[s.contact]}`;
  return 'limit set in the study';
}

/** The verdict of one sink. */
export function touchVerdictText(s: SinkTouchResult): string {
  if (!s.accessible) return 'not accessible';
  return s.passed ? `${formatQuantity(s.marginK, 'K')} below the limit` : `${formatQuantity(-s.marginK, 'K')} over the limit`;
}

/** The sinks that fail their touch limit, in words, or null when all pass. */
export function touchSummary(touch: TouchResult): string | null {
  const failed = Object.values(touch.sinks).filter((s) => !s.passed);
  if (failed.length === 0) return null;
  return `${failed.map((s) => `${s.sink} reaches ${formatQuantity(s.peakC, '°C')} (limit ${formatQuantity(s.limitC, '°C')})`).join(', ')}.`;
}
