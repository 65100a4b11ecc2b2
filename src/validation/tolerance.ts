import * as yup from 'yup';

import { MAX_AMBIENT_SHIFT_K, MAX_RUNS, MAX_SPREAD_PCT } from '../core/tolerance/constants';

/**
 * Limits the form and `POST /api/studies/:id/tolerance` share: the core's own
 * (src/core/tolerance), which also checks the study-dependent ones (corner count, total work).
 */
export const TOLERANCE_LIMITS = { maxRuns: MAX_RUNS, maxSpreadPct: MAX_SPREAD_PCT, maxAmbientShiftK: MAX_AMBIENT_SHIFT_K, maxSeed: 4_294_967_295 } as const;

const number = (label: string) =>
  yup
    .number()
    .typeError(`${label} must be a number`)
    .test('finite', `${label} must be a finite number`, (v) => v === undefined || Number.isFinite(v));

const spread = (label: string) =>
  number(label)
    .min(0, `${label} must be 0 % or more`)
    .max(TOLERANCE_LIMITS.maxSpreadPct, `${label} must be at most ${TOLERANCE_LIMITS.maxSpreadPct} % (a resistance must stay positive)`)
    .default(0);

const shift = (label: string) =>
  number(label)
    .min(-TOLERANCE_LIMITS.maxAmbientShiftK, `${label} must be at least −${TOLERANCE_LIMITS.maxAmbientShiftK} K`)
    .max(TOLERANCE_LIMITS.maxAmbientShiftK, `${label} must be at most ${TOLERANCE_LIMITS.maxAmbientShiftK} K`)
    .default(0);

const distribution = yup.string().oneOf(['uniform', 'normal'] as const, 'must be uniform or normal').optional();

/** The spreads and mode of a tolerance sweep; shared by the tolerance form and the route. */
export const toleranceSchema = yup
  .object({
    mode: yup.string().oneOf(['corners', 'monte-carlo'] as const, 'Mode must be corners or monte-carlo').required('Mode is required'),
    rthJcPct: spread('Rθjc spread'),
    rthSaPct: spread('Rθsa spread'),
    interfacePct: spread('Interface spread'),
    ambientLowK: shift('Ambient low'),
    ambientHighK: shift('Ambient high').when('ambientLowK', ([low], s) =>
      typeof low === 'number' && Number.isFinite(low) ? s.min(low, 'Ambient high must not be below ambient low') : s,
    ),
    linePct: spread('Line spread'),
    loadPct: spread('Load spread'),
    sharePct: spread('Share error'),
    runs: number('Runs')
      .integer('Runs must be a whole number')
      .min(1, 'Runs must be at least 1')
      .max(TOLERANCE_LIMITS.maxRuns, `Runs must be at most ${TOLERANCE_LIMITS.maxRuns.toLocaleString('en')}`)
      .default(1000),
    seed: number('Seed').integer('Seed must be a whole number').min(0, 'Seed must be 0 or more').max(TOLERANCE_LIMITS.maxSeed, 'Seed must fit in 32 bits').default(1),
    distributions: yup
      .object({
        rthJc: distribution,
        rthSa: distribution,
        interface: distribution,
        ambient: distribution,
        line: distribution,
        load: distribution,
        share: distribution,
      })
      .noUnknown(true, 'Unknown input: ${unknown}')
      .optional()
      .default(undefined),
  })
  .noUnknown(true, 'Unknown field: ${unknown}');

export type ToleranceInput = yup.InferType<typeof toleranceSchema>;
