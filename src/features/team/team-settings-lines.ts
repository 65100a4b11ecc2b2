import { BUILT_IN_DEFAULTS, type StudyDefaults } from '@/core/study';
import { touchLimitC, type TouchContact, type TouchMaterial } from '@/core/reliability';

/** One default as a person reads it: what, its value, where it comes from, whether the team set it. */
export type DefaultLine = { key: string; label: string; value: string; source: string; fromTeam: boolean };

export const MATERIAL_LABELS: Record<TouchMaterial, string> = { metal: 'Metal', glass: 'Glass', plastic: 'Plastic', wood: 'Wood' };
export const CONTACT_LABELS: Record<TouchContact, string> = { brief: 'Up to 10 s', short: 'Up to 1 min', long: 'Up to 8 h', continuous: 'Longer' };

const num = (n: number) => String(Number(n.toPrecision(6)));
const teamSource = (text: string) => text.trim() || 'team setting';

function line(key: string, label: string, team: number | null, unit: string, builtIn: { value: number; source: string } | null, source: string): DefaultLine {
  if (team !== null) return { key, label, value: `${num(team)}${unit}`, source: teamSource(source), fromTeam: true };
  if (builtIn) return { key, label, value: `${num(builtIn.value)}${unit}`, source: `built in: ${builtIn.source}`, fromTeam: false };
  return { key, label, value: 'not set', source: 'built in: none', fromTeam: false };
}

/** Every default a new study of the team starts with, team values and built-in ones alike. */
export function defaultLines(s: StudyDefaults): DefaultLine[] {
  const B = BUILT_IN_DEFAULTS;
  const lines: DefaultLine[] = [line('marginK', 'Margin below Tj,max', s.marginK, ' K', B.marginK, s.marginSource)];
  lines.push(
    s.siteAltitudeM !== null
      ? { key: 'siteAltitudeM', label: 'Site altitude', value: `${num(s.siteAltitudeM)} m${s.siteRadiationShare !== null ? `, radiation share ${num(s.siteRadiationShare)}` : ''}`, source: teamSource(s.siteSource), fromTeam: true }
      : { key: 'siteAltitudeM', label: 'Site altitude', value: 'sea level', source: `built in: ${B.siteAltitudeM.source}`, fromTeam: false },
  );
  lines.push({
    key: 'lifetimeInNewStudies',
    label: 'Life estimate in new studies',
    value: s.lifetimeInNewStudies ? `included, ${s.missionHoursPerDay === null ? '?' : num(s.missionHoursPerDay)} h a day` : 'left out',
    source: s.lifetimeInNewStudies ? 'team setting' : 'built in: a study has no life estimate until someone adds one',
    fromTeam: s.lifetimeInNewStudies,
  });
  lines.push(
    line('cyclingCoefficient', 'Power-cycling coefficient A', s.cyclingCoefficient, '', B.cyclingCoefficient, s.cyclingCoefficientSource),
    line('cyclingExponent', 'Power-cycling exponent α', s.cyclingExponent, '', B.cyclingExponent, s.cyclingExponentSource),
    line('cyclingActivationEV', 'Power-cycling activation energy', s.cyclingActivationEV, ' eV', B.cyclingActivationEV, s.cyclingActivationSource),
    line('arrheniusReferenceC', 'Arrhenius reference', s.arrheniusReferenceC, ' °C', null, ''),
    line('arrheniusActivationEV', 'Arrhenius activation energy', s.arrheniusActivationEV, ' eV', B.arrheniusActivationEV, s.arrheniusActivationSource),
  );
  if (s.touchLimitC !== null) {
    lines.push({ key: 'touch', label: 'Touch limit', value: `${num(s.touchLimitC)} °C`, source: teamSource(s.touchSource), fromTeam: true });
  } else if (s.touchMaterial !== null || s.touchContact !== null) {
    const m = s.touchMaterial ?? 'metal';
    const c = s.touchContact ?? 'brief';
    lines.push({ key: 'touch', label: 'Touch limit', value: `${MATERIAL_LABELS[m]}, ${CONTACT_LABELS[c].toLowerCase()}: ${touchLimitC(m, c)} °C`, source: teamSource(s.touchSource), fromTeam: true });
  } else {
    lines.push({ key: 'touch', label: 'Touch limit', value: 'not checked in new studies', source: `built in when a study checks it: ${B.touch.source}`, fromTeam: false });
  }
  return lines;
}
