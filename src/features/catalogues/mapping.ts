import type { ForcedAirColumn, ImportMapping, ImportPreview } from './types';

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** The server's suggested mapping in the form the mapping step edits. */
export function mappingFromSuggestion(preview: ImportPreview): ImportMapping {
  const fields: ImportMapping['fields'] = {};
  const known = new Set(preview.fields.map((f) => f.field));
  for (const [field, value] of Object.entries(preview.suggestedMapping)) {
    if (!known.has(field) || !isRecord(value) || typeof value.column !== 'string') continue;
    fields[field] = typeof value.unit === 'string' ? { column: value.column, unit: value.unit } : { column: value.column };
  }
  const suggested = preview.suggestedMapping.forcedAir;
  const forcedAir: ForcedAirColumn[] = Array.isArray(suggested)
    ? suggested.filter(
        (c): c is ForcedAirColumn => isRecord(c) && typeof c.column === 'string' && typeof c.airSpeedMPerS === 'number',
      )
    : [];
  return { fields, forcedAir };
}

/**
 * Keeps what the user chose when a corrected file comes back with the same columns; a file
 * with other columns starts again from the new suggestion.
 */
export function carryMapping(previous: ImportMapping | null, previousColumns: readonly string[], next: ImportPreview): ImportMapping {
  const same = previous !== null && previousColumns.length === next.columns.length && previousColumns.every((c, i) => c === next.columns[i]);
  return same ? previous : mappingFromSuggestion(next);
}

/** The body of the `mapping` form field: `{ field: { column, unit? }, forcedAir?: [...] }`. */
export function mappingBody(mapping: ImportMapping): Record<string, unknown> {
  return mapping.forcedAir.length ? { ...mapping.fields, forcedAir: mapping.forcedAir } : { ...mapping.fields };
}

/** Problems the user can fix before uploading: a column used twice, or an air speed that is not a positive number. */
export function mappingProblems(mapping: ImportMapping, labels: Record<string, string> = {}): string[] {
  const problems: string[] = [];
  const used = new Map<string, string>();
  for (const [field, m] of Object.entries(mapping.fields)) {
    const name = labels[field] ?? field;
    const other = used.get(m.column);
    if (other) problems.push(`Column "${m.column}" feeds both ${other} and ${name}.`);
    used.set(m.column, name);
  }
  mapping.forcedAir.forEach((c, i) => {
    if (!(c.airSpeedMPerS > 0)) problems.push(`Forced-air column ${i + 1} ("${c.column}"): the air speed must be a number above 0 m/s.`);
    if (used.has(c.column)) problems.push(`Column "${c.column}" is mapped to ${used.get(c.column)} and to a forced-air point.`);
  });
  return problems;
}
