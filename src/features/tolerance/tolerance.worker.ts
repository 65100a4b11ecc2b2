import { parseStudy } from '@/core/study';
import { evaluateNominal, evaluateRuns, planTolerance, summariseTolerance, type ToleranceSpec } from '@/core/tolerance';

import type { SweepReply, SweepRequest } from './tolerance-messages';

/**
 * A tolerance sweep off the page's main thread (web): the same core the server runs, in
 * blocks of runs with a progress message after each. A newer request ends this worker
 * (the page terminates it), so one sweep runs at a time.
 */
const scope = self as unknown as { onmessage: ((event: MessageEvent<SweepRequest>) => void) | null; postMessage: (reply: SweepReply) => void };

const BLOCKS = 50;

scope.onmessage = (event) => {
  const { id, document, input } = event.data;
  try {
    const plan = planTolerance(parseStudy(document), input as unknown as ToleranceSpec);
    const nominal = evaluateNominal(plan);
    const k = plan.inputs.length;
    const m = plan.doc.devices.length;
    const deviations = new Float64Array(plan.runs * k);
    const peaks = new Float64Array(plan.runs * m);
    const size = Math.max(1, Math.ceil(plan.runs / BLOCKS));
    for (let from = 0; from < plan.runs; from += size) {
      const to = Math.min(plan.runs, from + size);
      const block = evaluateRuns(plan, from, to);
      deviations.set(block.deviations, from * k);
      peaks.set(block.peaks, from * m);
      scope.postMessage({ id, kind: 'progress', done: to, total: plan.runs });
    }
    scope.postMessage({ id, kind: 'done', result: summariseTolerance(plan, nominal, { deviations, peaks }) });
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    const cut = message.indexOf(': ');
    scope.postMessage({ id, kind: 'failed', message, field: cut > 0 && /^[A-Za-z]+$/.test(message.slice(0, cut)) ? message.slice(0, cut) : undefined });
  }
};
