import { DEFAULT_ARRHENIUS_EV, LESIT_MODEL, type TouchContact, type TouchMaterial } from '../reliability';
import { DEFAULT_MARGIN_K } from './constants';
import { asNumber } from './field-reader';
import { parseLifetime, parseSite, parseTouch } from './parse-reliability';

/**
 * Defaults a team sets for the studies it starts (flat, so a form edits it directly). `null`
 * leaves the product's own default in force; a source is free text saying where a value comes
 * from (a datasheet, a report, the team's practice).
 */
export type StudyDefaults = {
  marginK: number | null;
  marginSource: string;
  siteAltitudeM: number | null;
  siteRadiationShare: number | null;
  siteSource: string;
  /** New studies get a `lifetime` section (mission and life model below). */
  lifetimeInNewStudies: boolean;
  missionHoursPerDay: number | null;
  cyclingCoefficient: number | null;
  cyclingCoefficientSource: string;
  cyclingExponent: number | null;
  cyclingExponentSource: string;
  cyclingActivationEV: number | null;
  cyclingActivationSource: string;
  arrheniusReferenceC: number | null;
  arrheniusActivationEV: number | null;
  arrheniusActivationSource: string;
  touchMaterial: TouchMaterial | null;
  touchContact: TouchContact | null;
  touchLimitC: number | null;
  touchSource: string;
};

export const EMPTY_STUDY_DEFAULTS: StudyDefaults = {
  marginK: null,
  marginSource: '',
  siteAltitudeM: null,
  siteRadiationShare: null,
  siteSource: '',
  lifetimeInNewStudies: false,
  missionHoursPerDay: null,
  cyclingCoefficient: null,
  cyclingCoefficientSource: '',
  cyclingExponent: null,
  cyclingExponentSource: '',
  cyclingActivationEV: null,
  cyclingActivationSource: '',
  arrheniusReferenceC: null,
  arrheniusActivationEV: null,
  arrheniusActivationSource: '',
  touchMaterial: null,
  touchContact: null,
  touchLimitC: null,
  touchSource: '',
};

/** The product's own defaults (what applies while a team sets none) and where they come from. */
export const BUILT_IN_DEFAULTS = {
  marginK: { value: DEFAULT_MARGIN_K, source: '20–25 K below Tj,max is common practice' },
  siteAltitudeM: { value: 0, source: 'sea level: catalogue ratings hold at sea-level pressure (U.S. Standard Atmosphere 1976)' },
  cyclingCoefficient: { value: LESIT_MODEL.coefficient, source: 'LESIT fit, Held et al. 1997 (from memory; wire-bonded IGBT modules)' },
  cyclingExponent: { value: LESIT_MODEL.exponent, source: 'LESIT fit, Held et al. 1997 (from memory)' },
  cyclingActivationEV: { value: LESIT_MODEL.activationEnergyEV, source: 'LESIT fit, Held et al. 1997: Q = 78 kJ/mol (from memory)' },
  arrheniusActivationEV: { value: DEFAULT_ARRHENIUS_EV, source: '0.7 eV for wear-out without a known mechanism (common practice)' },
  touch: { source: 'bare metal, brief contact: 60 °C after IEC 62368-1 TS1 (from memory; check the edition that applies)' },
} as const;

/** The defaults that need a source when a team sets them (the life model's parameters). */
export const SOURCED_DEFAULTS = [
  ['cyclingCoefficient', 'cyclingCoefficientSource'],
  ['cyclingExponent', 'cyclingExponentSource'],
  ['cyclingActivationEV', 'cyclingActivationSource'],
  ['arrheniusActivationEV', 'arrheniusActivationSource'],
] as const satisfies readonly (readonly [keyof StudyDefaults, keyof StudyDefaults])[];

type Section = Record<string, unknown>;

/** The parts of a study document the defaults set, with the source of each field (by document path). */
export type DefaultSections = {
  document: { marginK?: number; site?: Section; lifetime?: Section; touch?: Section };
  sources: Record<string, string>;
};

const given = (n: number | null): n is number => n !== null;
const sourceOr = (text: string) => text.trim() || 'team setting';

const hasLifeModel = (d: StudyDefaults) => SOURCED_DEFAULTS.some(([key]) => given(d[key] as number | null)) || given(d.arrheniusReferenceC);

/** The `lifetime` section of the defaults (null when nothing of it is set and it is not asked for). */
function lifetimeSection(d: StudyDefaults, sources: Record<string, string>): Section | null {
  if (!d.lifetimeInNewStudies && !given(d.missionHoursPerDay) && !hasLifeModel(d)) return null;
  const lifetime: Section = { mission: { hoursPerDay: d.missionHoursPerDay ?? undefined } };
  sources['lifetime.mission.hoursPerDay'] = 'team setting';
  const cycling: Section = {};
  const take = (key: 'coefficient' | 'exponent' | 'activationEnergyEV', value: number | null, source: string) => {
    if (!given(value)) return;
    cycling[key] = value;
    sources[`lifetime.powerCycling.${key}`] = sourceOr(source);
  };
  take('coefficient', d.cyclingCoefficient, d.cyclingCoefficientSource);
  take('exponent', d.cyclingExponent, d.cyclingExponentSource);
  take('activationEnergyEV', d.cyclingActivationEV, d.cyclingActivationSource);
  if (Object.keys(cycling).length > 0) lifetime.powerCycling = cycling;
  if (given(d.arrheniusReferenceC) || given(d.arrheniusActivationEV)) {
    const arrhenius: Section = { referenceC: d.arrheniusReferenceC ?? undefined };
    sources['lifetime.arrhenius.referenceC'] = 'team setting';
    if (given(d.arrheniusActivationEV)) {
      arrhenius.activationEnergyEV = d.arrheniusActivationEV;
      sources['lifetime.arrhenius.activationEnergyEV'] = sourceOr(d.arrheniusActivationSource);
    }
    lifetime.arrhenius = arrhenius;
  }
  return lifetime;
}

/**
 * The sections a new study takes from the defaults, as explicit values (so the study does not
 * change when the defaults do). Fields left unset are left out: the product's default applies.
 */
export function defaultSections(d: StudyDefaults): DefaultSections {
  const document: DefaultSections['document'] = {};
  const sources: Record<string, string> = {};
  if (given(d.marginK)) {
    document.marginK = d.marginK;
    sources.marginK = sourceOr(d.marginSource);
  }
  if (given(d.siteAltitudeM) || given(d.siteRadiationShare)) {
    const site: Section = { altitudeM: d.siteAltitudeM ?? undefined };
    sources['site.altitudeM'] = sourceOr(d.siteSource);
    if (given(d.siteRadiationShare)) {
      site.radiationShare = d.siteRadiationShare;
      sources['site.radiationShare'] = sourceOr(d.siteSource);
    }
    document.site = site;
  }
  if (d.lifetimeInNewStudies) {
    const life = lifetimeSection(d, sources);
    if (life) document.lifetime = life;
  }
  if (given(d.touchLimitC) || d.touchMaterial !== null || d.touchContact !== null) {
    const touch: Section = {};
    if (given(d.touchLimitC)) touch.limitC = d.touchLimitC;
    if (d.touchMaterial !== null) touch.material = d.touchMaterial;
    if (d.touchContact !== null) touch.contact = d.touchContact;
    for (const key of Object.keys(touch)) sources[`touch.${key}`] = sourceOr(d.touchSource);
    document.touch = touch;
  }
  return { document, sources };
}

/** Document path of a section field → the defaults field a form shows it in. */
const FIELD_OF_PATH: Record<string, keyof StudyDefaults> = {
  marginK: 'marginK',
  'site.altitudeM': 'siteAltitudeM',
  'site.radiationShare': 'siteRadiationShare',
  'lifetime.mission.hoursPerDay': 'missionHoursPerDay',
  'lifetime.mission': 'missionHoursPerDay',
  'lifetime.powerCycling.coefficient': 'cyclingCoefficient',
  'lifetime.powerCycling.exponent': 'cyclingExponent',
  'lifetime.powerCycling.activationEnergyEV': 'cyclingActivationEV',
  'lifetime.arrhenius.referenceC': 'arrheniusReferenceC',
  'lifetime.arrhenius.activationEnergyEV': 'arrheniusActivationEV',
  'touch.limitC': 'touchLimitC',
  'touch.material': 'touchMaterial',
  'touch.contact': 'touchContact',
};

export type DefaultsProblem = { field: keyof StudyDefaults; message: string };

/**
 * Checks the sections the defaults would write with the study's own parsers (the margin with
 * the same rule as `parseStudy`), so a setting can never make a new study invalid. Returns the
 * first problem, named by its defaults field, or null.
 */
export function checkDefaults(d: StudyDefaults): DefaultsProblem | null {
  const { document } = defaultSections(d);
  // Life-model defaults kept for later are checked too; without a mission they are checked under a stand-in one.
  const lifetime = document.lifetime ?? lifetimeSection(d, {});
  if (lifetime && !d.lifetimeInNewStudies && !given(d.missionHoursPerDay)) lifetime.mission = { repeatsPerDay: 1 };
  try {
    if (document.marginK !== undefined) asNumber(document.marginK, 'marginK', { min: 0, unit: 'K' });
    if (document.site) parseSite(document.site, 'site');
    if (lifetime) parseLifetime(lifetime, 'lifetime');
    if (document.touch) parseTouch(document.touch, 'touch', []);
  } catch (error) {
    if (!(error instanceof RangeError || error instanceof TypeError)) throw error;
    const cut = error.message.indexOf(': ');
    const path = error.message.slice(0, cut);
    const reason = error.message.slice(cut + 2);
    const field = FIELD_OF_PATH[path] ?? (path.startsWith('touch') ? 'touchLimitC' : path.startsWith('site') ? 'siteAltitudeM' : 'missionHoursPerDay');
    const why = path.endsWith('hoursPerDay') && reason.startsWith('is required') ? 'is required while new studies include a lifetime section' : reason;
    return { field, message: why };
  }
  for (const [key, source] of SOURCED_DEFAULTS) {
    if (given(d[key] as number | null) && (d[source] as string).trim() === '') return { field: source, message: 'say where this value comes from (a datasheet, a report, a test)' };
  }
  return null;
}
