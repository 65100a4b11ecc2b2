import { Op } from 'sequelize';
import type { StudyCreateInput } from '../../src/validation/studies';
import type { Db } from '../db';
import { AppError } from '../errors';
import type { Role, Study } from '../models';
import type { MembershipView } from './auth-service';

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
export type StudyView = StudySummary & { document: Record<string, unknown> | null };

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

export function studyView(s: Study): StudyView {
  return { ...summary(s), document: s.document ?? null };
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
  const study = Number.isSafeInteger(id) && teamIds.length > 0
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

export async function createStudy(db: Db, userId: number, memberships: MembershipView[], input: StudyCreateInput): Promise<StudyView> {
  const team = teamForNewStudy(memberships, input.teamId);
  const created = await db.models.Study.create({
    teamId: team.teamId,
    authorId: userId,
    title: input.title,
    description: input.description ?? '',
    document: (input.document as Record<string, unknown> | undefined) ?? null,
  });
  return studyView(await findStudy(db, memberships, created.id));
}
