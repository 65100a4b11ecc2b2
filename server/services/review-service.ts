import { Op } from 'sequelize';
import type { ReviewInput } from '../../src/validation/studies';
import type { Deps } from '../deps';
import { AppError } from '../errors';
import { reviewedMail, submittedMail } from '../mail/templates';
import type { Study } from '../models';
import { recordEvent } from './audit-service';
import type { SessionView } from './auth-service';
import { membershipIn, requireRole, requireStudyEditor } from './permissions';
import { findStudy, studyView, type StudyView } from './studies-service';

const studyLink = (deps: Deps, id: number) => `${deps.config.appUrl}/studies/${id}`;

/** Draft (or sent back) → in review; tells the team's reviewers and owners. */
export async function submitForReview(deps: Deps, auth: SessionView, study: Study): Promise<StudyView> {
  const { db } = deps;
  requireStudyEditor(auth, study);
  if (study.status !== 'draft' && study.status !== 'changes_requested') {
    throw new AppError(409, 'invalid_status', `Only a draft can be submitted; this study is ${study.status.replace('_', ' ')}`);
  }
  const changedMeanwhile = () => new AppError(409, 'version_conflict', 'Someone changed this study meanwhile: reload it and try again');
  await db.sequelize.transaction(async (transaction) => {
    // Compare-and-set on the version and status read above, so a save or a review that
    // committed meanwhile (in any server process) is not overwritten.
    const [count] = await db.models.Study.update(
      { status: 'in_review' },
      { where: { id: study.id, version: study.version, status: { [Op.in]: ['draft', 'changes_requested'] } }, transaction },
    );
    if (count === 0) throw changedMeanwhile();
    await recordEvent(db, { teamId: study.teamId, actorId: auth.user.id, action: 'study.submitted', subjectType: 'study', subjectId: study.id, details: { title: study.title, revision: study.version } }, transaction);
  });
  const reviewers = await db.models.Membership.findAll({
    where: { teamId: study.teamId, role: { [Op.in]: ['reviewer', 'owner'] }, userId: { [Op.ne]: auth.user.id } },
    include: [{ association: 'user', attributes: ['email'] }],
  });
  for (const r of reviewers) {
    await deps.mailer.send(submittedMail(r.user!.email, { studyTitle: study.title, author: auth.user.name, revision: study.version, link: studyLink(deps, study.id) }));
  }
  return studyView(db, await findStudy(db, auth.memberships, study.id));
}

/**
 * A reviewer's (or owner's) decision on the revision in review. Nobody approves a revision
 * they wrote themselves.
 */
export async function reviewStudy(deps: Deps, auth: SessionView, study: Study, input: ReviewInput): Promise<StudyView> {
  const { db } = deps;
  const m = membershipIn(auth, study.teamId);
  requireRole(m, ['reviewer', 'owner'], 'Only reviewers and owners can review studies');
  if (study.status !== 'in_review') throw new AppError(409, 'invalid_status', 'This study is not in review');
  if (input.revision !== undefined && input.revision !== study.version) {
    throw new AppError(409, 'version_conflict', `The study changed while you reviewed it: revision ${study.version} is now current`);
  }
  const revision = await db.models.Revision.findOne({ where: { studyId: study.id, number: study.version } });
  if (revision?.authorId === auth.user.id) throw AppError.forbidden('You cannot review a revision you wrote');

  await db.sequelize.transaction(async (transaction) => {
    // Only the revision that was read, and only while it is still in review: a save that
    // committed meanwhile made a new draft this decision is not about.
    const [count] = await db.models.Study.update({ status: input.decision }, { where: { id: study.id, version: study.version, status: 'in_review' }, transaction });
    if (count === 0) throw new AppError(409, 'version_conflict', 'The study changed while you reviewed it: reload it to see the current revision');
    await db.models.Review.create(
      { studyId: study.id, reviewerId: auth.user.id, revisionNumber: study.version, decision: input.decision, comment: input.comment ?? '' },
      { transaction },
    );
    await recordEvent(
      db,
      { teamId: study.teamId, actorId: auth.user.id, action: 'study.reviewed', subjectType: 'study', subjectId: study.id, details: { title: study.title, revision: study.version, decision: input.decision } },
      transaction,
    );
  });
  const author = await db.models.User.findByPk(study.authorId);
  if (author && author.id !== auth.user.id) {
    await deps.mailer.send(
      reviewedMail(author.email, {
        studyTitle: study.title,
        reviewer: auth.user.name,
        revision: study.version,
        approved: input.decision === 'approved',
        comment: input.comment ?? '',
        link: studyLink(deps, study.id),
      }),
    );
  }
  return studyView(db, await findStudy(db, auth.memberships, study.id));
}

export async function listReviews(deps: Deps, study: Study) {
  const rows = await deps.db.models.Review.findAll({
    where: { studyId: study.id },
    include: [{ association: 'reviewer', attributes: ['id', 'name'] }],
    order: [['id', 'ASC']],
  });
  return rows.map((r) => ({
    id: r.id,
    revision: r.revisionNumber,
    decision: r.decision,
    comment: r.comment,
    reviewer: r.reviewer ? { id: r.reviewer.id, name: r.reviewer.name } : null,
    createdAt: r.createdAt.toISOString(),
  }));
}
