import { ValidationError } from 'yup';

import { commentSchema } from '@/validation';

import type { CommentAnchor } from './types';

export type CommentFormValues = { body: string; timeS: string };

/** The request body: a chart-chosen pin wins over a typed time; a blank time means no pin. */
export function commentPayload(values: CommentFormValues, chartAnchor: CommentAnchor | null) {
  const typed = values.timeS.trim();
  const anchor: CommentAnchor | undefined =
    chartAnchor ?? (typed ? { kind: 'time', timeS: Number(typed.replace(',', '.')) } : undefined);
  return anchor ? { body: values.body, anchor } : { body: values.body };
}

/** Form errors from the shared schema, keyed by form field; the pin's path reads as "Time". */
export async function commentErrors(
  values: CommentFormValues,
  chartAnchor: CommentAnchor | null,
): Promise<Partial<Record<keyof CommentFormValues, string>>> {
  try {
    await commentSchema.validate(commentPayload(values, chartAnchor), { abortEarly: false });
    return {};
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    const errors: Partial<Record<keyof CommentFormValues, string>> = {};
    for (const inner of error.inner.length > 0 ? error.inner : [error]) {
      const field = inner.path === 'body' ? 'body' : 'timeS';
      errors[field] ??= inner.message.replace('anchor.timeS', 'Time');
    }
    return errors;
  }
}
