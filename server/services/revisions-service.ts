import { describeChanges, diffDocuments } from '../../src/core/diff';
import type { Db } from '../db';
import { AppError } from '../errors';
import type { Revision, Study } from '../models';
import type { SessionView } from './auth-service';
import { saveStudy } from './studies-service';

/** The parts of a revision a person compares: its title, description and document. */
const comparable = (r: Pick<Revision, 'title' | 'description' | 'document'>) => ({ title: r.title, description: r.description, document: r.document });

const SUMMARY_LINES = 12;

/** Every revision, newest first, each with a readable summary of what changed since the one before. */
export async function listRevisions(db: Db, study: Study) {
  const rows = await db.models.Revision.findAll({
    where: { studyId: study.id },
    include: [{ association: 'author', attributes: ['id', 'name'] }],
    order: [['number', 'ASC']],
  });
  const reviews = await db.models.Review.findAll({ where: { studyId: study.id }, include: [{ association: 'reviewer', attributes: ['id', 'name'] }], order: [['id', 'ASC']] });
  const out = rows.map((r, i) => {
    const changes = i === 0 ? [] : diffDocuments(comparable(rows[i - 1]), comparable(r));
    return {
      number: r.number,
      title: r.title,
      author: r.author ? { id: r.author.id, name: r.author.name } : null,
      createdAt: r.createdAt.toISOString(),
      changeCount: changes.length,
      summary: i === 0 ? ['created'] : describeChanges(changes.slice(0, SUMMARY_LINES)),
      reviews: reviews
        .filter((v) => v.revisionNumber === r.number)
        .map((v) => ({ decision: v.decision, reviewer: v.reviewer?.name ?? null, at: v.createdAt.toISOString() })),
    };
  });
  return out.reverse();
}

export async function findRevision(db: Db, study: Study, number: number): Promise<Revision> {
  const r = Number.isSafeInteger(number)
    ? await db.models.Revision.findOne({ where: { studyId: study.id, number }, include: [{ association: 'author', attributes: ['id', 'name'] }] })
    : null;
  if (!r) throw AppError.notFound('Revision');
  return r;
}

/** A revision, read-only, with what differs between it and the current study. */
export async function revisionView(db: Db, study: Study, number: number) {
  const r = await findRevision(db, study, number);
  const changes = diffDocuments(comparable(r), comparable(study));
  return {
    revision: {
      number: r.number,
      title: r.title,
      description: r.description,
      document: r.document,
      author: r.author ? { id: r.author.id, name: r.author.name } : null,
      createdAt: r.createdAt.toISOString(),
    },
    current: study.version,
    changesToCurrent: changes,
    summaryToCurrent: describeChanges(changes),
  };
}

/** Restores an old revision's content as a new revision (history is never rewritten). */
export async function restoreRevision(db: Db, auth: SessionView, study: Study, number: number, baseVersion: number) {
  const r = await findRevision(db, study, number);
  return saveStudy(db, auth, study, { baseVersion, title: r.title, description: r.description, document: r.document ?? null }, 'study.restored');
}
