import * as yup from 'yup';

export const STUDY_STATUSES = ['draft', 'in_review', 'changes_requested', 'approved'] as const;
export type StudyStatus = (typeof STUDY_STATUSES)[number];

/** Shared by the new-study form and `POST /api/studies`. */
export const studyCreateSchema = yup
  .object({
    title: yup.string().trim().min(1, 'Title is required').max(200, 'Title is at most 200 characters').required('Title is required'),
    description: yup.string().trim().max(4000, 'Description is at most 4000 characters').default(''),
    teamId: yup.number().integer('Team must be a whole number').positive('Team must be positive').optional(),
    document: yup.object().optional().default(undefined),
  })
  .noUnknown(true, 'Unknown field: ${unknown}');

export type StudyCreateInput = yup.InferType<typeof studyCreateSchema>;

/** `PUT /api/studies/:id`: the save carries the version it started from. */
export const studySaveSchema = yup
  .object({
    baseVersion: yup.number().integer('baseVersion must be a whole number').min(1, 'baseVersion must be at least 1').required('baseVersion is required'),
    title: yup.string().trim().min(1, 'Title is required').max(200, 'Title is at most 200 characters').optional(),
    description: yup.string().trim().max(4000, 'Description is at most 4000 characters').optional(),
    document: yup.object().nullable().optional().default(undefined),
  })
  .noUnknown(true, 'Unknown field: ${unknown}');
export type StudySaveInput = yup.InferType<typeof studySaveSchema>;

export const reviewSchema = yup
  .object({
    decision: yup.string().oneOf(['approved', 'changes_requested'] as const, 'Decision must be approved or changes_requested').required('Decision is required'),
    comment: yup
      .string()
      .trim()
      .max(4000, 'Comment is at most 4000 characters')
      .default('')
      .when('decision', {
        is: 'changes_requested',
        then: (s) => s.min(1, 'Say what should change'),
      }),
    revision: yup.number().integer().min(1).optional(),
  })
  .noUnknown(true, 'Unknown field: ${unknown}');
export type ReviewInput = yup.InferType<typeof reviewSchema>;

const finite = (label: string) =>
  yup.number().typeError(`${label} must be a number`).test('finite', `${label} must be a finite number`, (v) => v === undefined || Number.isFinite(v));

export const commentSchema = yup
  .object({
    body: yup.string().trim().min(1, 'Comment is empty').max(4000, 'Comment is at most 4000 characters').required('Comment is empty'),
    anchor: yup
      .object({
        kind: yup.string().oneOf(['time', 'soa'] as const, 'anchor.kind must be time or soa').required('anchor.kind is required'),
        timeS: finite('anchor.timeS').min(0, 'anchor.timeS must be at least 0').when('kind', { is: 'time', then: (s) => s.required('anchor.timeS is required') }),
        vceV: finite('anchor.vceV').positive('anchor.vceV must be positive').when('kind', { is: 'soa', then: (s) => s.required('anchor.vceV is required') }),
        icA: finite('anchor.icA').positive('anchor.icA must be positive').when('kind', { is: 'soa', then: (s) => s.required('anchor.icA is required') }),
      })
      .noUnknown(true, 'Unknown field: ${unknown}')
      .nullable()
      .optional()
      .default(undefined),
  })
  .noUnknown(true, 'Unknown field: ${unknown}');
export type CommentInput = yup.InferType<typeof commentSchema>;
