import { Router } from 'express';
import { Op } from 'sequelize';
import type { Deps } from '../deps';
import { AppError } from '../errors';
import { authOf, requireAuth } from '../middleware/auth';

/**
 * The local fake mail server's messages, for owners in development and tests only: the
 * messages to members and invitees of the teams they own.
 */
export function outboxRouter(deps: Deps) {
  const { db } = deps;
  const router = Router();
  router.use(requireAuth(db));

  router.get('/', async (_req, res) => {
    if (!deps.config.outboxReadable) throw AppError.notFound('Outbox');
    const owned = authOf(res).memberships.filter((m) => m.role === 'owner').map((m) => m.teamId);
    if (owned.length === 0) throw AppError.forbidden('Only team owners read the outbox');
    const members = await db.models.Membership.findAll({ where: { teamId: { [Op.in]: owned } }, include: [{ association: 'user', attributes: ['email'] }] });
    const invitees = await db.models.Invitation.findAll({ where: { teamId: { [Op.in]: owned } }, attributes: ['email'] });
    const addresses = [...new Set([...members.map((m) => m.user!.email), ...invitees.map((i) => i.email)])];
    const messages = await db.models.MailMessage.findAll({ where: { to: { [Op.in]: addresses } }, order: [['id', 'DESC']], limit: 200 });
    res.json({
      messages: messages.map((m) => ({ id: m.id, to: m.to, subject: m.subject, text: m.text, html: m.html, links: m.links, createdAt: m.createdAt.toISOString() })),
    });
  });

  return router;
}
