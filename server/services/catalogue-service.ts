import { Op, type ModelStatic, type Model } from 'sequelize';
import { ValidationError, type AnyObjectSchema } from 'yup';
import type { Db } from '../db';
import { AppError } from '../errors';
import { recordEvent } from './audit-service';
import type { SessionView } from './auth-service';
import { mapRows, suggestMapping, type ColumnMapping, type FieldSpec, type RowError } from './csv/map-rows';
import { readCsv } from './csv/read-csv';
import { writeCsv } from './csv/write-csv';
import { membershipIn, requireRole } from './permissions';
import { EDITOR_ROLES, teamForNewStudy } from './studies-service';
import { typeErrors } from '../validate';

/** What differs between one team catalogue and another (heatsinks, interface materials). */
export type CatalogueKind<V> = {
  noun: string;
  modelOf: (db: Db) => ModelStatic<Model>;
  schema: AnyObjectSchema;
  specs: FieldSpec[];
  /** Fields built from several columns (e.g. forced-air points), applied after the plain ones. */
  extraFromRow?: (cells: (column: string) => string | undefined, mapping: Record<string, unknown>) => { value: Record<string, unknown>; errors: { column: string; message: string }[] };
  /** Suggestions for the multi-column fields, from the header names. */
  suggestExtra?: (headers: string[]) => Record<string, unknown>;
  view: (row: Model) => V;
  /** Columns every export has, in order; a row may add more (sorted after these). */
  exportHeaders: string[];
  exportRow: (v: V) => Record<string, unknown>;
};

type Row = Model & { id: number; teamId: number };

export function catalogueService<V>(kind: CatalogueKind<V>) {
  const action = (verb: string) => `${kind.noun.toLowerCase().replace(/ /g, '_')}.${verb}`;
  const modelOf = (db: Db) => kind.modelOf(db) as unknown as ModelStatic<Row>;

  async function list(db: Db, auth: SessionView, teamId?: number) {
    const teamIds = teamId !== undefined ? [membershipIn(auth, teamId).teamId] : auth.memberships.map((m) => m.teamId);
    if (teamIds.length === 0) return [];
    const rows = await modelOf(db).findAll({ where: { teamId: { [Op.in]: teamIds } } as never, order: [['name', 'ASC'], ['id', 'ASC']] });
    return rows.map(kind.view);
  }

  async function find(db: Db, auth: SessionView, id: number) {
    const teamIds = auth.memberships.map((m) => m.teamId);
    const row = Number.isSafeInteger(id) && teamIds.length ? await modelOf(db).findOne({ where: { id, teamId: { [Op.in]: teamIds } } as never }) : null;
    if (!row) throw AppError.notFound(kind.noun);
    return row;
  }

  function validate(input: unknown, path = ''): Record<string, unknown> {
    const wrong = typeErrors(kind.schema, input);
    if (wrong.length) throw AppError.badRequest(wrong.map((w) => `${path}${w.path}: ${w.message}`).join('; '), wrong.map((w) => ({ ...w, path: `${path}${w.path}` })));
    try {
      return kind.schema.validateSync(input, { abortEarly: false }) as Record<string, unknown>;
    } catch (err) {
      if (!(err instanceof ValidationError)) throw err;
      const inner = err.inner.length ? err.inner : [err];
      const seen = new Set<string>();
      const details = inner
        .map((e) => ({ path: `${path}${e.path ?? ''}`, message: e.message }))
        .filter((d) => !seen.has(d.path) && seen.add(d.path));
      throw AppError.badRequest(details.map((d) => `${d.path}: ${d.message}`).join('; '), details);
    }
  }

  async function create(db: Db, auth: SessionView, input: Record<string, unknown>) {
    const m = teamForNewStudy(auth.memberships, input.teamId as number | undefined);
    const { teamId: _ignored, ...values } = validate(input);
    const row = await db.sequelize.transaction(async (transaction) => {
      const r = await modelOf(db).create({ ...values, teamId: m.teamId } as never, { transaction });
      await recordEvent(db, { teamId: m.teamId, actorId: auth.user.id, action: action('created'), subjectId: r.id, details: { name: values.name } }, transaction);
      return r;
    });
    return kind.view(row);
  }

  async function update(db: Db, auth: SessionView, id: number, input: Record<string, unknown>) {
    const row = await find(db, auth, id);
    requireRole(membershipIn(auth, row.teamId), EDITOR_ROLES, `Reviewers cannot edit the ${kind.noun.toLowerCase()} catalogue`);
    const { teamId: _ignored, ...values } = validate(input);
    await db.sequelize.transaction(async (transaction) => {
      await row.update(values as never, { transaction });
      await recordEvent(db, { teamId: row.teamId, actorId: auth.user.id, action: action('updated'), subjectId: row.id, details: { name: values.name } }, transaction);
    });
    return kind.view(row);
  }

  async function remove(db: Db, auth: SessionView, id: number) {
    const row = await find(db, auth, id);
    requireRole(membershipIn(auth, row.teamId), EDITOR_ROLES, `Reviewers cannot edit the ${kind.noun.toLowerCase()} catalogue`);
    await db.sequelize.transaction(async (transaction) => {
      await recordEvent(db, { teamId: row.teamId, actorId: auth.user.id, action: action('deleted'), subjectId: row.id }, transaction);
      await row.destroy({ transaction });
    });
  }

  /** The columns found, the first rows and a suggested mapping: the mapping step of an import. */
  function preview(buffer: Buffer) {
    const table = readCsv(buffer);
    return {
      columns: table.headers,
      delimiter: table.delimiter,
      rowCount: table.rows.length,
      firstRows: table.rows.slice(0, 10).map((r) => r.cells),
      suggestedMapping: { ...suggestMapping(table.headers, kind.specs), ...kind.suggestExtra?.(table.headers) },
      fields: kind.specs.map((s) => ({ field: s.field, label: s.label, kind: s.kind, ...(s.kind === 'quantity' ? { units: s.units, defaultUnit: s.defaultUnit } : {}) })),
    };
  }

  /**
   * Imports every row or none: each row is mapped, then validated like a form; all problems
   * come back with their row and column, and nothing is written unless there are none.
   */
  async function importCsv(db: Db, auth: SessionView, buffer: Buffer, mapping: ColumnMapping & Record<string, unknown>, teamId?: number) {
    const m = teamForNewStudy(auth.memberships, teamId);
    const table = readCsv(buffer);
    const plain = Object.fromEntries(Object.entries(mapping).filter(([k]) => kind.specs.some((s) => s.field === k))) as ColumnMapping;
    const { records, errors } = mapRows(table, kind.specs, plain);
    const all: RowError[] = [...errors];
    const fieldColumn = (field: string) => plain[field.split(/[.[]/)[0]]?.column ?? field;
    const values: Record<string, unknown>[] = [];
    const cellErrorsAt = new Set(errors.map((e) => `${e.row}:${e.field}`));
    for (const { line, record } of records) {
      const cells = (column: string) => table.rows[line - 2].cells[table.headers.indexOf(column)];
      const extra = kind.extraFromRow?.(cells, mapping) ?? { value: {}, errors: [] };
      for (const e of extra.errors) all.push({ row: line, column: e.column, field: '', message: e.message });
      try {
        const { teamId: _ignored, ...v } = validate({ ...record, ...extra.value });
        values.push(v);
      } catch (err) {
        if (!(err instanceof AppError)) throw err;
        // A cell that could not be read is reported once, not again as "required".
        for (const d of err.details ?? []) {
          if (!cellErrorsAt.has(`${line}:${d.path}`)) all.push({ row: line, column: fieldColumn(d.path), field: d.path, message: d.message });
        }
      }
    }
    all.sort((a, b) => a.row - b.row);
    if (all.length) {
      const details = all.slice(0, 200).map((e) => ({ path: `row ${e.row}, ${e.column}`, message: e.message, row: e.row, column: e.column }));
      throw new AppError(400, 'import_failed', `Nothing was imported: ${all.length} problem(s) in the file, the first at row ${all[0].row}, column "${all[0].column}": ${all[0].message}`, details);
    }
    await db.sequelize.transaction(async (transaction) => {
      await modelOf(db).bulkCreate(values.map((v) => ({ ...v, teamId: m.teamId })) as never[], { transaction });
      await recordEvent(db, { teamId: m.teamId, actorId: auth.user.id, action: action('imported'), details: { rows: values.length } }, transaction);
    });
    return { imported: values.length, teamId: m.teamId };
  }

  async function exportCsv(db: Db, auth: SessionView, teamId?: number) {
    const rows = await list(db, auth, teamId);
    const lines = rows.map(kind.exportRow);
    const extra = [...new Set(lines.flatMap((l) => Object.keys(l)))].filter((h) => !kind.exportHeaders.includes(h)).sort();
    const headers = [...kind.exportHeaders, ...extra];
    return writeCsv(headers, lines.map((l) => headers.map((h) => l[h])));
  }

  return { list, find, create, update, remove, preview, importCsv, exportCsv, view: kind.view };
}
