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
