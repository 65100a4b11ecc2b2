import { ROLE_LABELS } from '@/features/auth/roles';
import type { Role } from '@/features/auth/types';

import type { ActivityEvent } from './types';

/** Names the log refers to by id: studies still in the team and current members. */
export type ActivityNames = {
  studyTitle: (id: number) => string | undefined;
  memberName: (userId: number) => string | undefined;
};

export type EventSentence = { text: string; studyId?: number };

const quoted = (title: string) => `“${title}”`;

function detail(event: ActivityEvent, key: string): unknown {
  return event.details?.[key];
}

function roleName(value: unknown): string {
  return typeof value === 'string' && value in ROLE_LABELS ? ROLE_LABELS[value as Role].toLowerCase() : String(value);
}

/** "heatsink.created" → "heatsink"; "interface_material.imported" → "interface material". */
function catalogueNoun(action: string): string {
  return action.split('.')[0].replace(/_/g, ' ');
}

function studyEvent(event: ActivityEvent, actor: string, names: ActivityNames): EventSentence | null {
  const id = event.subjectId ?? undefined;
  const current = id === undefined ? undefined : names.studyTitle(id);
  const savedTitle = detail(event, 'title');
  const title = quoted(current ?? (typeof savedTitle === 'string' ? savedTitle : `study #${id ?? '?'}`));
  const revision = detail(event, 'revision');
  const link = current === undefined ? {} : { studyId: id };
  switch (event.action) {
    case 'study.created':
      return { text: `${actor} created ${title}`, ...link };
    case 'study.saved': {
      const wasApproved = detail(event, 'previousStatus') === 'approved';
      const note = wasApproved ? ', a new draft after its approval' : '';
      return { text: `${actor} saved ${title} as revision ${revision}${note}`, ...link };
    }
    case 'study.submitted':
      return { text: `${actor} submitted ${title} revision ${revision} for review`, ...link };
    case 'study.reviewed':
      return detail(event, 'decision') === 'approved'
        ? { text: `${actor} approved ${title} revision ${revision}`, ...link }
        : { text: `${actor} asked for changes to ${title} revision ${revision}`, ...link };
    case 'study.restored':
      return { text: `${actor} restored an earlier revision of ${title} as revision ${revision}`, ...link };
    case 'study.deleted':
      return { text: `${actor} deleted ${title}` };
    case 'study.duplicated': {
      const from = detail(event, 'from');
      const source = typeof from === 'number' ? names.studyTitle(from) : undefined;
      return { text: `${actor} copied ${source ? quoted(source) : 'a study'} as ${title}`, ...link };
    }
    case 'comment.added':
      return { text: `${actor} commented on ${title}`, ...link };
    default:
      return null;
  }
}

function memberEvent(event: ActivityEvent, actor: string, names: ActivityNames): EventSentence | null {
  const self = event.subjectId !== null && event.subjectId === event.actor?.id;
  const member = (event.subjectId !== null && names.memberName(event.subjectId)) || 'a former member';
  switch (event.action) {
    case 'member.role_changed': {
      const change = `from ${roleName(detail(event, 'from'))} to ${roleName(detail(event, 'to'))}`;
      return { text: self ? `${actor} changed their own role ${change}` : `${actor} changed the role of ${member} ${change}` };
    }
    case 'member.removed':
      return { text: self ? `${actor} left the team` : `${actor} removed ${member} from the team` };
    case 'invitation.sent':
      return { text: `${actor} invited ${detail(event, 'email')} as ${roleName(detail(event, 'role'))}` };
    case 'invitation.revoked':
      return { text: `${actor} revoked an invitation` };
    case 'invitation.accepted':
      return { text: `${actor} accepted an invitation and joined as ${roleName(detail(event, 'role'))}` };
    default:
      return null;
  }
}

function catalogueEvent(event: ActivityEvent, actor: string): EventSentence | null {
  const noun = catalogueNoun(event.action);
  if (event.action.endsWith('.created')) {
    const name = detail(event, 'name');
    const what = typeof name === 'string' ? `the ${noun} ${quoted(name)}` : `a ${noun}`;
    return { text: `${actor} added ${what} to the catalogue` };
  }
  if (event.action.endsWith('.deleted')) return { text: `${actor} deleted a ${noun} from the catalogue` };
  if (event.action.endsWith('.imported')) {
    const rows = detail(event, 'rows');
    return { text: `${actor} imported ${typeof rows === 'number' ? rows : 'several'} ${noun} rows from CSV` };
  }
  return null;
}

/** Names of the team settings in the log (src/core/study/study-defaults.ts). */
const SETTING_NAMES: Record<string, string> = {
  marginK: 'margin',
  siteAltitudeM: 'site altitude',
  siteRadiationShare: 'radiation share',
  lifetimeInNewStudies: 'life estimate in new studies',
  missionHoursPerDay: 'hours a day',
  cyclingCoefficient: 'power-cycling A',
  cyclingExponent: 'power-cycling α',
  cyclingActivationEV: 'power-cycling Ea',
  arrheniusReferenceC: 'Arrhenius reference',
  arrheniusActivationEV: 'Arrhenius Ea',
  touchMaterial: 'touch surface',
  touchContact: 'touch contact',
  touchLimitC: 'touch limit',
};

function settingsEvent(event: ActivityEvent, actor: string): EventSentence | null {
  if (event.action !== 'team.settings_changed') return null;
  const changed = detail(event, 'changed');
  const names = Array.isArray(changed) ? changed.map((k) => SETTING_NAMES[String(k)] ?? (String(k).endsWith('Source') ? null : String(k))).filter((n): n is string => n !== null) : [];
  const what = names.length > 0 ? `: ${names.join(', ')}` : ' (sources)';
  return { text: `${actor} changed the team's defaults for new studies${what}` };
}

/** One event as a sentence a person reads: “Dan Designer submitted “…” revision 2 for review”. */
export function describeEvent(event: ActivityEvent, names: ActivityNames): EventSentence {
  const actor = event.actor?.name ?? 'Someone';
  return (
    studyEvent(event, actor, names) ??
    memberEvent(event, actor, names) ??
    catalogueEvent(event, actor) ??
    settingsEvent(event, actor) ?? { text: `${actor}: ${event.action.replace(/[._]/g, ' ')}` }
  );
}
