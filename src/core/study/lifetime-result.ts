import { DAYS_PER_YEAR, cyclesToFailure, lifeFromDamage, rainflow, rainflowPeriodic, repeatsPerDay, type PowerCyclingModel, type RainflowCycles } from '../reliability';
import type { Ambient, StudyDocument } from './types';
import type { JunctionHistory } from './junction-history';
import type { CycleClass, CycleHistogram, DeviceLifetime, LifetimeResult } from './reliability-result-types';
import { HISTOGRAM_BINS, MAX_LISTED_CYCLES, MIN_REPORTED_RANGE_K } from './constants';

/** Smallest of 1, 2, 5 × 10^k at least x. */
function niceStep(x: number): number {
  const p = Math.pow(10, Math.floor(Math.log10(x)));
  for (const f of [1, 2, 5, 10]) if (f * p >= x * (1 - 1e-12)) return f * p;
  return 10 * p;
}

function histogram(c: RainflowCycles, damage: Float64Array, total: number, largest: number): CycleHistogram {
  if (!(largest >= MIN_REPORTED_RANGE_K)) return { edgesK: [], counts: [], damageShare: [] };
  const width = niceStep(largest / HISTOGRAM_BINS);
  const bins = Math.max(1, Math.ceil(largest / width + 1e-9));
  const counts = new Array<number>(bins).fill(0);
  const share = new Array<number>(bins).fill(0);
  for (let k = 0; k < c.length; k++) {
    if (c.range[k] < MIN_REPORTED_RANGE_K) continue;
    const b = Math.min(bins - 1, Math.floor(c.range[k] / width));
    counts[b] += c.count[k];
    if (total > 0) share[b] += damage[k] / total;
  }
  return { edgesK: Array.from({ length: bins + 1 }, (_, i) => i * width), counts, damageShare: share };
}

/** Cycle classes by range (0.1 K) and mean (1 °C), the most damaging first. */
function dominantClasses(model: PowerCyclingModel, c: RainflowCycles, damage: Float64Array, total: number): CycleClass[] {
  const index = new Map<number, number>();
  const classes: { rangeK: number; meanC: number; count: number; damage: number }[] = [];
  for (let k = 0; k < c.length; k++) {
    if (c.range[k] < MIN_REPORTED_RANGE_K) continue;
    const r = Math.round(c.range[k] * 10);
    const m = Math.round(c.mean[k]);
    const key = r * 1e6 + m;
    let at = index.get(key);
    if (at === undefined) {
      at = classes.length;
      index.set(key, at);
      classes.push({ rangeK: r / 10, meanC: m, count: 0, damage: 0 });
    }
    classes[at].count += c.count[k];
    classes[at].damage += damage[k];
  }
  return classes
    .sort((a, b) => b.damage - a.damage || b.rangeK - a.rangeK)
    .slice(0, MAX_LISTED_CYCLES)
    .map((x) => ({
      rangeK: x.rangeK,
      meanC: x.meanC,
      count: x.count,
      cyclesToFailure: cyclesToFailure(model, x.rangeK, x.meanC),
      damageShare: total > 0 ? x.damage / total : 0,
    }));
}

/** Lowest ambient of the study, °C: where a cold start begins. */
function coldestAmbientC(ambient: Ambient): number {
  return ambient.kind === 'constant' ? ambient.temperatureC : Math.min(...ambient.points.map((p) => p.temperatureC));
}

/**
 * Life of each device from its junction history (PHYSICS.md §6): rainflow counting (ASTM
 * E1049 §5.4.4; a periodic study's one period closed as a repeating block), Nf per cycle
 * from the power-cycling law, Palmgren–Miner damage per repeat, repeats per day from the
 * mission, life in years; with `arrhenius`, the time-weighted factor against its reference.
 */
export function lifetimeResult(doc: StudyDocument, history: JunctionHistory, periodic: boolean): LifetimeResult | undefined {
  const lifetime = doc.lifetime;
  if (!lifetime) return undefined;
  const model = lifetime.powerCycling;
  const countedS = history.endS;
  const perDay = repeatsPerDay(lifetime.mission, countedS);
  const hoursPerDay = (perDay * countedS) / 3600;
  const devices: Record<string, DeviceLifetime> = {};
  let shortest: LifetimeResult['shortest'];
  doc.devices.forEach((device, d) => {
    const points = history.turningPoints(d);
    const c = periodic ? rainflowPeriodic(points) : rainflow(points);
    const damage = new Float64Array(c.length);
    let total = 0;
    let cycles = 0;
    let largest = 0;
    for (let k = 0; k < c.length; k++) {
      damage[k] = c.count[k] / cyclesToFailure(model, c.range[k], c.mean[k]);
      total += damage[k];
      if (c.range[k] >= MIN_REPORTED_RANGE_K) cycles += c.count[k];
      if (c.range[k] > largest) largest = c.range[k];
    }
    let life = lifeFromDamage(total, perDay);
    let startCycle: DeviceLifetime['startCycle'];
    if (lifetime.startsPerDay > 0 && points.length > 0) {
      // One cycle per start from the coldest ambient up to the period's highest junction temperature.
      const low = coldestAmbientC(doc.ambient);
      let high = -Infinity;
      for (const v of points) if (v > high) high = v;
      const rangeK = Math.max(0, high - low);
      const meanC = (high + low) / 2;
      const nf = cyclesToFailure(model, rangeK, meanC);
      startCycle = { rangeK, meanC, cyclesToFailure: nf, damagePerDay: lifetime.startsPerDay / nf };
      const perDayTotal = life.damagePerDay + startCycle.damagePerDay;
      life = { ...life, damagePerDay: perDayTotal, years: perDayTotal > 0 ? 1 / (perDayTotal * DAYS_PER_YEAR) : Infinity };
    }
    const out: DeviceLifetime = {
      device: device.id,
      cycles,
      largestRangeK: largest,
      histogram: histogram(c, damage, total, largest),
      dominant: dominantClasses(model, c, damage, total),
      damagePerRepeat: total,
      damagePerDay: life.damagePerDay,
      repeatsToFailure: Number.isFinite(life.repeatsToFailure) ? life.repeatsToFailure : null,
      lifeYears: Number.isFinite(life.years) ? life.years : null,
      truncated: history.truncated(d),
    };
    if (startCycle) out.startCycle = startCycle;
    const avg = history.arrhenius(d);
    if (avg && lifetime.arrhenius) {
      const meanFactor = avg.mean();
      out.arrhenius = { ...lifetime.arrhenius, meanFactor, equivalentHoursPerDay: meanFactor * hoursPerDay };
    }
    devices[device.id] = out;
    if (out.lifeYears !== null && (!shortest || out.lifeYears < shortest.lifeYears)) shortest = { device: device.id, lifeYears: out.lifeYears };
  });
  const result: LifetimeResult = {
    model,
    mission: lifetime.mission,
    counted: periodic ? 'period' : 'run',
    countedS,
    repeatsPerDay: perDay,
    hoursPerDay,
    devices,
  };
  if (shortest) result.shortest = shortest;
  return result;
}
