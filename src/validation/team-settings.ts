import * as yup from 'yup';

import { checkDefaults, EMPTY_STUDY_DEFAULTS, type StudyDefaults } from '../core/study';
import { TOUCH_CONTACTS, TOUCH_MATERIALS, type TouchContact, type TouchMaterial } from '../core/reliability';

const number = (label: string) =>
  yup
    .number()
    .typeError(`${label} must be a number`)
    .test('finite', `${label} must be a finite number`, (v) => v === undefined || v === null || Number.isFinite(v))
    .nullable()
    .default(null);

const source = () => yup.string().trim().max(200, 'A source is at most 200 characters').default('');

const CHOICES: Record<string, readonly unknown[]> = { touchMaterial: TOUCH_MATERIALS, touchContact: TOUCH_CONTACTS };

function wellTyped(value: Record<string, unknown>): boolean {
  return Object.entries(EMPTY_STUDY_DEFAULTS).every(([key, empty]) => {
    const v = value[key];
    if (v === null || v === undefined) return true;
    if (CHOICES[key]) return CHOICES[key].includes(v);
    if (typeof empty === 'boolean') return typeof v === 'boolean';
    if (typeof empty === 'string') return typeof v === 'string';
    return typeof v === 'number' && Number.isFinite(v);
  });
}

/**
 * Team defaults for new studies: `PUT /api/teams/:id/settings` and the team settings form. The
 * types and sizes are checked here; the values with the study's own parsers (`checkDefaults`),
 * so the field at fault is named with the parser's reason.
 */
export const teamSettingsSchema = yup
  .object({
    marginK: number('Margin'),
    marginSource: source(),
    siteAltitudeM: number('Altitude'),
    siteRadiationShare: number('Radiation share'),
    siteSource: source(),
    lifetimeInNewStudies: yup.boolean().typeError('must be true or false').default(false),
    missionHoursPerDay: number('Hours a day'),
    cyclingCoefficient: number('Coefficient A'),
    cyclingCoefficientSource: source(),
    cyclingExponent: number('Exponent α'),
    cyclingExponentSource: source(),
    cyclingActivationEV: number('Activation energy'),
    cyclingActivationSource: source(),
    arrheniusReferenceC: number('Reference temperature'),
    arrheniusActivationEV: number('Activation energy'),
    arrheniusActivationSource: source(),
    touchMaterial: yup.string<TouchMaterial>().nullable().oneOf([...TOUCH_MATERIALS, null], `must be one of ${TOUCH_MATERIALS.join(', ')}`).default(null),
    touchContact: yup.string<TouchContact>().nullable().oneOf([...TOUCH_CONTACTS, null], `must be one of ${TOUCH_CONTACTS.join(', ')}`).default(null),
    touchLimitC: number('Touch limit'),
    touchSource: source(),
  })
  .noUnknown(true, 'Unknown field: ${unknown}')
  .test('study-sections', 'The defaults would not make a valid study', function check(value) {
    // A field of the wrong type already has its own error.
    if (!wellTyped(value as Record<string, unknown>)) return true;
    const problem = checkDefaults({ ...EMPTY_STUDY_DEFAULTS, ...(value as Partial<StudyDefaults>) });
    return problem ? this.createError({ path: problem.field, message: problem.message }) : true;
  });

export type TeamSettingsInput = yup.InferType<typeof teamSettingsSchema>;
