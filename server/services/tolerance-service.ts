import { planTolerance, summariseTolerance, type ToleranceResult, type ToleranceSpec } from '../../src/core/tolerance';
import type { ToleranceInput } from '../../src/validation/tolerance';
import { AppError } from '../errors';
import type { Study } from '../models';
import { tolerancePool, sweepInPool } from '../workers/tolerance-pool';
import { checkDocument } from './study-document';

function badRequest(err: Error): AppError {
  const cut = err.message.indexOf(': ');
  const path = cut > 0 ? err.message.slice(0, cut) : '(body)';
  return AppError.badRequest(err.message, [{ path, message: cut > 0 ? err.message.slice(cut + 2) : err.message }]);
}

/**
 * A tolerance sweep of a study's document: checked and set up here (a spec the study cannot
 * take answers 400 naming the field), the runs solved in chunks on the worker pool, the
 * statistics gathered here.
 */
export async function sweepStudy(study: Study, input: ToleranceInput): Promise<{ version: number; result: ToleranceResult }> {
  if (!study.document) throw new AppError(409, 'no_document', 'This study has no study document to sweep yet');
  const doc = checkDocument(study.document);
  const spec: ToleranceSpec = { ...input, distributions: input.distributions ?? undefined };
  let plan;
  try {
    plan = planTolerance(doc, spec);
  } catch (err) {
    if (err instanceof RangeError || err instanceof TypeError) throw badRequest(err);
    throw err;
  }
  try {
    const runs = await sweepInPool(tolerancePool(), { document: study.document, spec }, plan.runs);
    return { version: study.version, result: summariseTolerance(plan, runs.nominal, runs) };
  } catch (err) {
    // A run the solver refuses (a perturbed study past a work limit) is the client's to fix.
    if (err instanceof RangeError || err instanceof TypeError) throw badRequest(err);
    throw err;
  }
}
