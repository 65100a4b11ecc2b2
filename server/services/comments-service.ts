import type { CommentInput } from '../../src/validation/studies';
import type { Db } from '../db';
import { AppError } from '../errors';
import type { Comment, CommentAnchor, Study } from '../models';
import { recordEvent } from './audit-service';
import type { SessionView } from './auth-service';
import { membershipIn } from './permissions';

const view = (c: Comment) => ({
  id: c.id,
  body: c.body,
  anchor: c.anchor,
  revision: c.revisionNumber,
  author: c.author ? { id: c.author.id, name: c.author.name } : null,
  createdAt: c.createdAt.toISOString(),
});

export async function listComments(db: Db, study: Study) {
  const rows = await db.models.Comment.findAll({
    where: { studyId: study.id },
    include: [{ association: 'author', attributes: ['id', 'name'] }],
    order: [['id', 'ASC']],
  });
  return rows.map(view);
}

/** Every member may comment, reviewers included; a comment belongs to the current revision. */
export async function addComment(db: Db, auth: SessionView, study: Study, input: CommentInput) {
  membershipIn(auth, study.teamId);
  const id = await db.sequelize.transaction(async (transaction) => {
    const c = await db.models.Comment.create(
      { studyId: study.id, authorId: auth.user.id, revisionNumber: study.version, body: input.body, anchor: (input.anchor as CommentAnchor | undefined) ?? null },
      { transaction },
    );
    await recordEvent(db, { teamId: study.teamId, actorId: auth.user.id, action: 'comment.added', subjectType: 'study', subjectId: study.id, details: { comment: c.id } }, transaction);
    return c.id;
  });
  const c = await db.models.Comment.findByPk(id, { include: [{ association: 'author', attributes: ['id', 'name'] }] });
  return view(c!);
}

export async function deleteComment(db: Db, auth: SessionView, study: Study, commentId: number) {
  const m = membershipIn(auth, study.teamId);
  const c = Number.isSafeInteger(commentId) ? await db.models.Comment.findOne({ where: { id: commentId, studyId: study.id } }) : null;
  if (!c) throw AppError.notFound('Comment');
  if (c.authorId !== auth.user.id && m.role !== 'owner') throw AppError.forbidden('Only its author or a team owner can delete a comment');
  await c.destroy();
}
