import type { Transaction } from 'sequelize';
import type { Db } from '../db';

export type AuditInput = {
  teamId: number;
  actorId: number | null;
  action: string;
  subjectType?: string;
  subjectId?: number;
  details?: Record<string, unknown>;
};

export async function recordEvent(db: Db, e: AuditInput, transaction?: Transaction) {
  await db.models.AuditEvent.create(
    { teamId: e.teamId, actorId: e.actorId, action: e.action, subjectType: e.subjectType ?? null, subjectId: e.subjectId ?? null, details: e.details ?? null },
    { transaction },
  );
}

export async function listEvents(db: Db, teamId: number, limit = 200) {
  const rows = await db.models.AuditEvent.findAll({
    where: { teamId },
    include: [{ association: 'actor', attributes: ['id', 'name', 'email'] }],
    order: [['id', 'DESC']],
    limit,
  });
  return rows.map((r) => ({
    id: r.id,
    action: r.action,
    actor: r.actor ? { id: r.actor.id, name: r.actor.name } : null,
    subjectType: r.subjectType,
    subjectId: r.subjectId,
    details: r.details,
    createdAt: r.createdAt.toISOString(),
  }));
}
