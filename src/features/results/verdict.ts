import type { DeviceResult, DeviceSoaResult, StudyResult } from '@/core/study';
import { formatDuration, formatNumber, formatQuantity } from '@/features/studies/quantity-format';

export type Verdict = {
  passes: boolean;
  /** One sentence: the answer to the study's question. */
  headline: string;
  /** Further facts a reader needs with the answer (shutdowns, time above target, periodic state). */
  notes: string[];
};

const kelvin = (k: number) => formatQuantity(k, 'K');
const celsius = (c: number) => formatQuantity(c, '°C');
const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function failure(d: DeviceResult): string {
  const target =
    d.marginToTargetK < 0
      ? `exceeds its ${celsius(d.targetC)} target by ${kelvin(-d.marginToTargetK)}`
      : `reaches its ${celsius(d.targetC)} target`;
  const max = d.marginToMaxK < 0 ? ` and its ${celsius(d.tjMaxC)} Tj,max by ${kelvin(-d.marginToMaxK)}` : '';
  return `${d.id} ${target}${max} at ${formatDuration(d.peakTimeS)}`;
}

function soaFailure(id: string, r: DeviceSoaResult): string {
  const w = r.worst;
  if (!w) return `${id} is outside its SOA`;
  const points = r.failedPoints === 1 ? '' : ` (${plural(r.failedPoints, 'point', 'points')} outside)`;
  return `${id} is outside its derated SOA at ${formatDuration(w.timeS)}: ${formatQuantity(w.icA, 'A')} at ${formatQuantity(w.vceV, 'V')}, ${formatNumber(w.margin * 100)} % of the allowed current${points}`;
}

/**
 * The plain-language answer. A study passes only when every junction stays below its target
 * and every operating point lies inside its derated SOA: the margin at the worst point when
 * it does, otherwise each device that does not, by how much and when.
 */
export function studyVerdict(result: StudyResult): Verdict {
  const devices = Object.values(result.devices);
  const notes: string[] = [];
  const soaFailing = Object.entries(result.soa ?? {}).filter(([, r]) => !r.passed);
  const passes = result.meetsTarget && soaFailing.length === 0;
  let headline: string;
  if (passes) {
    const worst = result.devices[result.worst.device];
    const target = worst ? ` to the ${celsius(worst.targetC)} target` : '';
    headline = `Passes: ${kelvin(result.worst.marginToTargetK)} margin${target} at the worst point, ${result.worst.device} at ${formatDuration(result.worst.timeS)}`;
  } else {
    const failing = devices.filter((d) => d.marginToTargetK <= 0).sort((a, b) => a.marginToTargetK - b.marginToTargetK);
    headline = `Fails: ${[...failing.map(failure), ...soaFailing.map(([id, r]) => soaFailure(id, r))].join('; ')}`;
  }
  for (const d of devices) {
    if (d.timeAboveTargetS > 0) notes.push(`${d.id} spends ${formatDuration(d.timeAboveTargetS)} at or above its target.`);
    if (d.shutdowns > 0) notes.push(`${d.id} trips its thermal shutdown ${plural(d.shutdowns, 'time', 'times')}: the output stops until the junction cools.`);
  }
  const periodic = result.solver.periodic;
  if (periodic) {
    notes.push(
      periodic.converged
        ? 'Periodic steady state: the figures are for the profile repeated until every period is the same as the last.'
        : `The periodic state did not settle (last change ${formatNumber(periodic.residualK)} K).`,
    );
  }
  return { passes, headline, notes };
}
