import * as yup from 'yup';

const strict = 'Unknown field: ${unknown}';
const num = (label: string) =>
  yup
    .number()
    .typeError(`${label} must be a number`)
    .test('finite', `${label} must be a finite number`, (v) => v === undefined || v === null || Number.isFinite(v));
const positive = (label: string) => num(label).positive(`${label} must be greater than 0`);
const optionalPositive = (label: string) => positive(label).nullable().optional().default(null);

export const SINK_MATERIALS = ['aluminium', 'copper'] as const;

export const forcedAirPointSchema = yup
  .object({
    airSpeedMPerS: positive('Air speed').max(50, 'Air speed above 50 m/s is not plausible').required('Air speed is required'),
    rthKPerW: positive('Rθsa at that air speed').required('Rθsa at that air speed is required'),
  })
  .noUnknown(true, strict);

/** A catalogue heatsink: Rθsa in still air at a stated rise (and its convection exponent), optional forced-air points. */
export const heatsinkSchema = yup
  .object({
    teamId: yup.number().integer().positive().optional(),
    name: yup.string().trim().min(1, 'Name is required').max(120, 'Name is at most 120 characters').required('Name is required'),
    description: yup.string().trim().max(2000, 'Description is at most 2000 characters').default(''),
    rthKPerW: positive('Rθsa').max(1000, 'Rθsa above 1000 K/W is not a heatsink').required('Rθsa is required'),
    referenceRiseK: positive('Reference rise').max(300, 'Reference rise is at most 300 K').default(75),
    // n of Rθsa(ΔT) = Rθsa,ref (ΔTref/ΔT)^n, in the range the heatsink core and the study's
    // naturalConvection.exponent accept; null is the laminar default, 1/4.
    convectionExponent: num('Convection exponent')
      .min(0, 'Convection exponent must lie in 0…1 (1/4 for laminar natural convection)')
      .max(1, 'Convection exponent must lie in 0…1 (1/4 for laminar natural convection)')
      .nullable()
      .optional()
      .default(null),
    forcedAir: yup
      .array(forcedAirPointSchema)
      .max(20, 'At most 20 forced-air points')
      .default([])
      .test('increasing', 'Forced-air points need distinct air speeds', (pts) => !pts || new Set(pts.map((p) => p.airSpeedMPerS)).size === pts.length),
    massKg: optionalPositive('Mass').max(100, 'Mass above 100 kg is not plausible'),
    material: yup.string().oneOf(SINK_MATERIALS, 'Material must be aluminium or copper').nullable().optional().default(null),
    capacityJPerK: optionalPositive('Heat capacity'),
    widthMm: optionalPositive('Width'),
    lengthMm: optionalPositive('Length'),
    heightMm: optionalPositive('Height'),
    devicesPerSink: yup.number().typeError('Devices per sink must be a number').integer('Devices per sink must be a whole number').min(1, 'Devices per sink must be at least 1').max(64).default(1),
    price: num('Price').min(0, 'Price cannot be negative').nullable().optional().default(null),
    notes: yup.string().trim().max(4000, 'Notes are at most 4000 characters').default(''),
  })
  .noUnknown(true, strict);
export type HeatsinkInput = yup.InferType<typeof heatsinkSchema>;

/** Thermal interface: a typical value per package, or bulk conductivity × thickness over an area. */
export const interfaceMaterialSchema = yup
  .object({
    teamId: yup.number().integer().positive().optional(),
    name: yup.string().trim().min(1, 'Name is required').max(120, 'Name is at most 120 characters').required('Name is required'),
    kind: yup.string().oneOf(['per_package', 'per_area'] as const, 'Kind must be per_package or per_area').required('Kind is required'),
    packageName: yup
      .string()
      .trim()
      .max(40)
      .nullable()
      .default(null)
      .when('kind', { is: 'per_package', then: (s) => s.required('Package is required for a per-package value') }),
    rthKPerW: positive('Rθcs')
      .nullable()
      .default(null)
      .when('kind', { is: 'per_package', then: (s) => s.required('Rθcs is required for a per-package value') }),
    conductivityWPerMK: positive('Conductivity')
      .nullable()
      .default(null)
      .when('kind', { is: 'per_area', then: (s) => s.required('Conductivity is required for a per-area value') }),
    thicknessMm: positive('Thickness')
      .nullable()
      .default(null)
      .when('kind', { is: 'per_area', then: (s) => s.required('Thickness is required for a per-area value') }),
    contactKCm2PerW: num('Contact resistance').min(0, 'Contact resistance cannot be negative').nullable().default(null),
    notes: yup.string().trim().max(4000).default(''),
  })
  .noUnknown(true, strict);
export type InterfaceMaterialInput = yup.InferType<typeof interfaceMaterialSchema>;
