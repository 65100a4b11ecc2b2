import { Op, type Transaction } from 'sequelize';
import type { DefaultSections } from '../../src/core/study';
import type { StudyCreateInput, StudySaveInput } from '../../src/validation/studies';
import type { Db } from '../db';
import { AppError } from '../errors';
import type { Role, Study } from '../models';
import { recordEvent } from './audit-service';
import type { MembershipView, SessionView } from './auth-service';
import { requireStudyEditor } from './permissions';
import { checkDocument } from './study-document';
import { defaultsForNewStudy } from './team-settings-service';

export const EDITOR_ROLES: readonly Role[] = ['owner', 'designer'];

export type StudySummary = {
  id: number;
  teamId: number;
  teamName: string;
  title: string;
  description: string;
  status: Study['status'];
  version: number;
  author: { id: number; name: string };
  createdAt: string;
  updatedAt: string;
};
export type Approval = { revision: number; reviewer: { id: number; name: string } | null; at: string };
/** `teamDefaults`: what the study took from its team's defaults when it was started (its editor starts from them). */
export type StudyView = StudySummary & { document: Record<string, unknown> | null; approval: Approval | null; teamDefaults: DefaultSections | null };

const include = [
  { association: 'author', attributes: ['id', 'name'] },
  { association: 'team', attributes: ['id', 'name'] },
];

function summary(s: Study): StudySummary {
  return {
    id: s.id,
    teamId: s.teamId,
    teamName: s.team?.name ?? '',
    title: s.title,
    description: s.description,
    status: s.status,
    version: s.version,
    author: { id: s.author?.id ?? s.authorId, name: s.author?.name ?? '' },
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}

/** The latest approval, shown only while the study is approved (editing starts a new draft). */
async function currentApproval(db: Db, s: Study): Promise<Approval | null> {
  if (s.status !== 'approved') return null;
  const review = await db.models.Review.findOne({
    where: { studyId: s.id, decision: 'approved' },
    include: [{ association: 'reviewer', attributes: ['id', 'name'] }],
    order: [['id', 'DESC']],
  });
  if (!review) return null;
  return {
    revision: review.revisionNumber,
    reviewer: review.reviewer ? { id: review.reviewer.id, name: review.reviewer.name } : null,
    at: review.createdAt.toISOString(),
  };
}

export async function studyView(db: Db, s: Study): Promise<StudyView> {
  return { ...summary(s), document: s.document ?? null, approval: await currentApproval(db, s), teamDefaults: s.teamDefaults ?? null };
}

export async function listStudies(db: Db, memberships: MembershipView[]): Promise<StudySummary[]> {
  const teamIds = memberships.map((m) => m.teamId);
  if (teamIds.length === 0) return [];
  const rows = await db.models.Study.findAll({
    where: { teamId: { [Op.in]: teamIds } },
    attributes: { exclude: ['document'] },
    include,
    order: [['updatedAt', 'DESC']],
  });
  return rows.map(summary);
}

/** Finds a study of one of the user's teams; anything else is "not found", never "forbidden". */
export async function findStudy(db: Db, memberships: MembershipView[], id: number): Promise<Study> {
  const teamIds = memberships.map((m) => m.teamId);
  const study =
    Number.isSafeInteger(id) && teamIds.length > 0
      ? await db.models.Study.findOne({ where: { id, teamId: { [Op.in]: teamIds } }, include })
      : null;
  if (!study) throw AppError.notFound('Study');
  return study;
}

/** Picks the team a new study belongs to: the one asked for, or the first the user may edit in. */
export function teamForNewStudy(memberships: MembershipView[], teamId?: number): MembershipView {
  if (teamId !== undefined) {
    const m = memberships.find((x) => x.teamId === teamId);
    if (!m) throw AppError.notFound('Team');
    if (!EDITOR_ROLES.includes(m.role)) throw AppError.forbidden('Reviewers cannot create studies');
    return m;
  }
  const m = memberships.find((x) => EDITOR_ROLES.includes(x.role));
  if (!m) throw AppError.forbidden('Reviewers cannot create studies');
  return m;
}

type NewStudy = { teamId: number; authorId: number; title: string; description: string; document: Record<string, unknown> | null; teamDefaults?: DefaultSections | null };

/** Inserts a study and its first revision. */
export async function insertStudy(db: Db, s: NewStudy, transaction: Transaction): Promise<Study> {
  const study = await db.models.Study.create({ ...s, teamDefaults: s.teamDefaults ?? null, version: 1 }, { transaction });
  await db.models.Revision.create(
    { studyId: study.id, number: 1, authorId: s.authorId, title: s.title, description: s.description, document: s.document },
    { transaction },
  );
  return study;
}

export async function createStudy(db: Db, auth: SessionView, input: StudyCreateInput): Promise<StudyView> {
  const team = teamForNewStudy(auth.memberships, input.teamId);
  if (input.document) checkDocument(input.document);
  const id = await db.sequelize.transaction(async (transaction) => {
    // A study started empty takes the team's defaults as they are now; a file's document is kept as it is.
    const teamDefaults = input.document ? null : await defaultsForNewStudy(db, team.teamId, transaction);
    const study = await insertStudy(
      db,
      {
        teamId: team.teamId,
        authorId: auth.user.id,
        title: input.title,
        description: input.description ?? '',
        document: (input.document as Record<string, unknown> | undefined) ?? null,
        teamDefaults,
      },
      transaction,
    );
    await recordEvent(db, { teamId: team.teamId, actorId: auth.user.id, action: 'study.created', subjectType: 'study', subjectId: study.id, details: { title: input.title } }, transaction);
    return study.id;
  });
  return studyView(db, await findStudy(db, auth.memberships, id));
}

/**
 * Saves a new revision when `baseVersion` is still current; otherwise 409 with the current
 * study, so the client can show both versions and nothing is lost. Editing a study that is in
 * review or approved turns it back into a draft: approvals belong to the revision they were on.
 */
export async function saveStudy(db: Db, auth: SessionView, study: Study, input: StudySaveInput, action = 'study.saved'): Promise<StudyView> {
  requireStudyEditor(auth, study);
  const conflict = async () =>
    new AppError(409, 'version_conflict', `Someone saved this study first (now version ${study.version}); your changes are not saved yet`, undefined, {
      current: await studyView(db, await findStudy(db, auth.memberships, study.id)),
    });
  if (input.baseVersion !== study.version) throw await conflict();
  if (input.document) checkDocument(input.document);

  const next = {
    title: input.title ?? study.title,
    description: input.description ?? study.description,
    document: input.document === undefined ? study.document : (input.document as Record<string, unknown> | null),
  };
  const saved = await db.sequelize.transaction(async (transaction) => {
    const [count] = await db.models.Study.update(
      { ...next, version: input.baseVersion + 1, status: 'draft' },
      { where: { id: study.id, version: input.baseVersion }, transaction },
    );
    if (count === 0) return false;
    await db.models.Revision.create({ studyId: study.id, number: input.baseVersion + 1, authorId: auth.user.id, ...next }, { transaction });
    await recordEvent(
      db,
      { teamId: study.teamId, actorId: auth.user.id, action, subjectType: 'study', subjectId: study.id, details: { title: next.title, revision: input.baseVersion + 1, previousStatus: study.status } },
      transaction,
    );
    return true;
  });
  if (!saved) {
    await study.reload();
    throw await conflict();
  }
  return studyView(db, await findStudy(db, auth.memberships, study.id));
}

export async function deleteStudy(db: Db, auth: SessionView, study: Study) {
  requireStudyEditor(auth, study);
  await db.sequelize.transaction(async (transaction) => {
    await recordEvent(db, { teamId: study.teamId, actorId: auth.user.id, action: 'study.deleted', subjectType: 'study', subjectId: study.id, details: { title: study.title } }, transaction);
    await study.destroy({ transaction });
  });
}

/** A copy of the current revision as a new draft of the user's own. */
export async function duplicateStudy(db: Db, auth: SessionView, study: Study): Promise<StudyView> {
  const m = teamForNewStudy(auth.memberships, study.teamId);
  const title = `${study.title} (copy)`.slice(0, 200);
  const id = await db.sequelize.transaction(async (transaction) => {
    const copy = await insertStudy(db, { teamId: m.teamId, authorId: auth.user.id, title, description: study.description, document: study.document, teamDefaults: study.teamDefaults }, transaction);
    await recordEvent(db, { teamId: m.teamId, actorId: auth.user.id, action: 'study.duplicated', subjectType: 'study', subjectId: copy.id, details: { from: study.id } }, transaction);
    return copy.id;
  });
  return studyView(db, await findStudy(db, auth.memberships, id));
}
