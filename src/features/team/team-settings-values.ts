import { ValidationError } from 'yup';

import type { StudyDefaults } from '@/core/study';
import type { TouchContact, TouchMaterial } from '@/core/reliability';
import { editText, readText, type FieldKind } from '@/features/study-editor/quantity-text';
import { teamSettingsSchema } from '@/validation';

/** The numeric defaults, each with how its text is read (units with SI prefixes where it has one). */
export const QUANTITY_FIELDS = {
  marginK: 'temperatureDifference',
  siteAltitudeM: 'length',
  siteRadiationShare: 'number',
  missionHoursPerDay: 'number',
  cyclingCoefficient: 'number',
  cyclingExponent: 'number',
  cyclingActivationEV: 'number',
  arrheniusReferenceC: 'temperature',
  arrheniusActivationEV: 'number',
  touchLimitC: 'temperature',
} as const satisfies Partial<Record<keyof StudyDefaults, FieldKind>>;

export type QuantityKey = keyof typeof QUANTITY_FIELDS;
export type TouchRuleKind = 'product' | 'table' | 'limit';

/** What the form edits: numbers as typed text, sources as text, the touch rule as a choice. */
export type TeamSettingsFormValues = Record<QuantityKey, string> &
  Pick<StudyDefaults, 'marginSource' | 'siteSource' | 'cyclingCoefficientSource' | 'cyclingExponentSource' | 'cyclingActivationSource' | 'arrheniusActivationSource' | 'touchSource' | 'lifetimeInNewStudies'> & {
    touchRule: TouchRuleKind;
    touchMaterial: TouchMaterial;
    touchContact: TouchContact;
  };

export function formValuesFrom(s: StudyDefaults): TeamSettingsFormValues {
  const quantities = Object.fromEntries(
    (Object.keys(QUANTITY_FIELDS) as QuantityKey[]).map((key) => {
      const value = s[key];
      return [key, value === null ? '' : editText(value, QUANTITY_FIELDS[key])];
    }),
  ) as Record<QuantityKey, string>;
  return {
    ...quantities,
    marginSource: s.marginSource,
    siteSource: s.siteSource,
    lifetimeInNewStudies: s.lifetimeInNewStudies,
    cyclingCoefficientSource: s.cyclingCoefficientSource,
    cyclingExponentSource: s.cyclingExponentSource,
    cyclingActivationSource: s.cyclingActivationSource,
    arrheniusActivationSource: s.arrheniusActivationSource,
    touchRule: s.touchLimitC !== null ? 'limit' : s.touchMaterial !== null || s.touchContact !== null ? 'table' : 'product',
    touchMaterial: s.touchMaterial ?? 'metal',
    touchContact: s.touchContact ?? 'brief',
    touchSource: s.touchSource,
  };
}

export type ReadSettings = { settings: StudyDefaults; errors: Partial<Record<keyof StudyDefaults, string>> };

/** The defaults the form's text stands for, and the fields whose text does not read as a number. */
export function readFormValues(v: TeamSettingsFormValues): ReadSettings {
  const errors: ReadSettings['errors'] = {};
  const number = (key: QuantityKey): number | null => {
    const text = v[key].trim();
    if (text === '') return null;
    const read = readText(text, QUANTITY_FIELDS[key]);
    if (read.ok) return read.value;
    errors[key] = read.reason;
    return null;
  };
  const settings: StudyDefaults = {
    marginK: number('marginK'),
    marginSource: v.marginSource.trim(),
    siteAltitudeM: number('siteAltitudeM'),
    siteRadiationShare: number('siteRadiationShare'),
    siteSource: v.siteSource.trim(),
    lifetimeInNewStudies: v.lifetimeInNewStudies,
    missionHoursPerDay: number('missionHoursPerDay'),
    cyclingCoefficient: number('cyclingCoefficient'),
    cyclingCoefficientSource: v.cyclingCoefficientSource.trim(),
    cyclingExponent: number('cyclingExponent'),
    cyclingExponentSource: v.cyclingExponentSource.trim(),
    cyclingActivationEV: number('cyclingActivationEV'),
    cyclingActivationSource: v.cyclingActivationSource.trim(),
    arrheniusReferenceC: number('arrheniusReferenceC'),
    arrheniusActivationEV: number('arrheniusActivationEV'),
    arrheniusActivationSource: v.arrheniusActivationSource.trim(),
    touchMaterial: v.touchRule === 'table' ? v.touchMaterial : null,
    touchContact: v.touchRule === 'table' ? v.touchContact : null,
    touchLimitC: v.touchRule === 'limit' ? number('touchLimitC') : null,
    touchSource: v.touchRule === 'product' ? '' : v.touchSource.trim(),
  };
  return { settings, errors };
}

/** formik's `validate`: text that does not read first, then the shared schema (the study's own parsers). */
export function validateFormValues(v: TeamSettingsFormValues): Record<string, string> {
  const { settings, errors } = readFormValues(v);
  if (Object.keys(errors).length > 0) return errors as Record<string, string>;
  try {
    teamSettingsSchema.validateSync(settings, { abortEarly: false });
    return {};
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    const out: Record<string, string> = {};
    for (const e of error.inner.length > 0 ? error.inner : [error]) if (e.path && !(e.path in out)) out[e.path] = e.message;
    return out;
  }
}
