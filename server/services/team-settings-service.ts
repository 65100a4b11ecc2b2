import type { Transaction } from 'sequelize';
import { defaultSections, EMPTY_STUDY_DEFAULTS, type DefaultSections, type StudyDefaults } from '../../src/core/study';
import type { TeamSettingsInput } from '../../src/validation/team-settings';
import type { Db } from '../db';
import { AppError } from '../errors';
import { recordEvent } from './audit-service';
import type { SessionView } from './auth-service';
import { membershipIn, requireRole } from './permissions';

export type TeamSettingsView = {
  teamId: number;
  settings: StudyDefaults;
  /** 0 while the team has never set any. */
  version: number;
  updatedAt: string | null;
  updatedBy: { id: number; name: string } | null;
};

async function findRow(db: Db, teamId: number, transaction?: Transaction) {
  return db.models.TeamSetting.findOne({ where: { teamId }, include: [{ association: 'updatedBy', attributes: ['id', 'name'] }], transaction });
}

/** Stored settings over the empty ones, so a field added later reads as "not set". */
const complete = (stored: Partial<StudyDefaults> | null | undefined): StudyDefaults => ({ ...EMPTY_STUDY_DEFAULTS, ...(stored ?? {}) });

/** Any member reads the team's defaults. */
export async function getTeamSettings(db: Db, auth: SessionView, teamId: number, transaction?: Transaction): Promise<TeamSettingsView> {
  membershipIn(auth, teamId);
  const row = await findRow(db, teamId, transaction);
  return {
    teamId,
    settings: complete(row?.settings),
    version: row?.version ?? 0,
    updatedAt: row?.updatedAt.toISOString() ?? null,
    updatedBy: row?.updatedBy ? { id: row.updatedBy.id, name: row.updatedBy.name } : null,
  };
}

/**
 * Owners replace the team's defaults; studies already started keep the values they hold. With
 * `baseVersion` (the version the owner read) the save must be on top of it: another owner's
 * save in between answers 409 `version_conflict` with the settings as they are now, and
 * nothing is written.
 */
export async function updateTeamSettings(db: Db, auth: SessionView, teamId: number, input: TeamSettingsInput, baseVersion?: number): Promise<TeamSettingsView> {
  requireRole(membershipIn(auth, teamId), ['owner'], 'Only owners change the team settings');
  const next = complete(input as Partial<StudyDefaults>);
  await db.sequelize.transaction(async (transaction) => {
    // The team's row lock orders two owners saving at once (PostgreSQL); SQLite writes one at a time anyway.
    await db.models.Team.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE });
    const row = await db.models.TeamSetting.findOne({ where: { teamId }, transaction });
    const current = row?.version ?? 0;
    if (baseVersion !== undefined && baseVersion !== current) {
      throw new AppError(409, 'version_conflict', `Another owner saved the team settings first (now version ${current}); your changes are not saved yet`, undefined, {
        current: await getTeamSettings(db, auth, teamId, transaction),
      });
    }
    const before = complete(row?.settings);
    const changed = (Object.keys(next) as (keyof StudyDefaults)[]).filter((k) => before[k] !== next[k]);
    if (changed.length === 0) return;
    if (row) await row.update({ settings: next, version: row.version + 1, updatedById: auth.user.id }, { transaction });
    else await db.models.TeamSetting.create({ teamId, settings: next, updatedById: auth.user.id }, { transaction });
    await recordEvent(
      db,
      {
        teamId,
        actorId: auth.user.id,
        action: 'team.settings_changed',
        subjectType: 'team',
        subjectId: teamId,
        details: { changed, from: Object.fromEntries(changed.map((k) => [k, before[k]])), to: Object.fromEntries(changed.map((k) => [k, next[k]])) },
      },
      transaction,
    );
  });
  return getTeamSettings(db, auth, teamId);
}

/**
 * What a study started now takes from its team's defaults (inside the caller's transaction),
 * or null when the team sets none.
 */
export async function defaultsForNewStudy(db: Db, teamId: number, transaction?: Transaction): Promise<DefaultSections | null> {
  const row = await db.models.TeamSetting.findOne({ where: { teamId }, transaction });
  if (!row) return null;
  const sections = defaultSections(complete(row.settings));
  return Object.keys(sections.document).length > 0 ? sections : null;
}
