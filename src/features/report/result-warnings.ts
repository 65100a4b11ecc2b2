import type { StudyResult } from '@/core/study';

const RAIL_PREFIX = 'railPlan: ';

/**
 * The solver's warnings that the SOA and rail-plan parts of the report do not already give
 * beside their own figures (the core repeats theirs in `result.warnings`).
 */
export function generalWarnings(result: StudyResult): string[] {
  const rail = new Set(result.railPlan?.warnings ?? []);
  const soaStarts = Object.values(result.soa).flatMap((s) => [
    `${s.device} leaves its safe operating area`,
    ...s.warnings.map((w) => `${s.device}: ${w.message}`),
  ]);
  return result.warnings.filter((w) => !rail.has(w) && !soaStarts.some((start) => w.startsWith(start)));
}

/** A rail-plan warning without the field prefix the solver list uses. */
export function railWarningText(warning: string): string {
  return warning.startsWith(RAIL_PREFIX) ? warning.slice(RAIL_PREFIX.length) : warning;
}
