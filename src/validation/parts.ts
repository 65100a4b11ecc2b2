import * as yup from 'yup';
import { parseElectrical, parsePackage, parseSoa } from '../core/study';

export const PART_KINDS = ['regulator', 'bipolar', 'darlington', 'mosfet'] as const;

/** Runs a core checker and turns its "path: reason" error into a yup error at that path. */
function coreCheck(field: string, check: (value: unknown) => void) {
  return yup
    .mixed()
    .test(field, '', function (value) {
      if (value === null || value === undefined) return true;
      try {
        check(value);
        return true;
      } catch (err) {
        if (!(err instanceof RangeError || err instanceof TypeError)) throw err;
        const cut = err.message.indexOf(': ');
        const inner = cut > 0 ? err.message.slice(0, cut) : field;
        const path = inner === field || inner.startsWith(`${field}.`) || inner.startsWith(`${field}[`) ? inner : `${field}.${inner}`;
        return this.createError({ path, message: cut > 0 ? err.message.slice(cut + 2) : err.message });
      }
    });
}

/**
 * A part of the library: `thermal` and `electrical` are written as a study device's `package`
 * and `electrical` (docs/study-format.md) and checked by the same parser; `soa` by the SOA core.
 */
export const partSchema = yup
  .object({
    teamId: yup.number().integer().positive().optional(),
    name: yup.string().trim().min(1, 'Name is required').max(120, 'Name is at most 120 characters').required('Name is required'),
    kind: yup.string().oneOf(PART_KINDS, 'Kind must be regulator, bipolar, darlington or mosfet').required('Kind is required'),
    packageName: yup.string().trim().max(40, 'Package is at most 40 characters').default(''),
    description: yup.string().trim().max(2000).default(''),
    tjMaxC: yup.number().typeError('Tj,max must be a number').min(50, 'Tj,max below 50 °C is not plausible').max(250, 'Tj,max above 250 °C is not plausible').required('Tj,max is required'),
    thermal: coreCheck('thermal', (v) => parsePackage(v, 'thermal')).required('The thermal model is required'),
    electrical: coreCheck('electrical', (v) => parseElectrical(v, 'electrical')).nullable().default(null),
    soa: coreCheck('soa', (v) => parseSoa(v, 'soa')).nullable().default(null),
    zthPoints: yup
      .array(
        yup.object({
          timeS: yup.number().positive('Zth time must be positive').required(),
          zthKPerW: yup.number().positive('Zth must be positive').required(),
        }),
      )
      .max(500, 'At most 500 Zth points')
      .nullable()
      .default(null),
    zthFit: yup.object().nullable().default(null),
    notes: yup.string().trim().max(4000).default(''),
  })
  .noUnknown(true, 'Unknown field: ${unknown}');
export type PartInput = yup.InferType<typeof partSchema>;
