import { BURN_CAUTION_C, checkTouch } from '../reliability';
import type { StudyDocument } from './types';
import type { SinkResult } from './result-types';
import type { TouchResult } from './reliability-result-types';

/** Each sink's peak surface temperature against its touch limit, and the burn caution (PHYSICS.md §7). */
export function touchResult(doc: StudyDocument, sinks: Record<string, SinkResult>): TouchResult | undefined {
  if (!doc.touch) return undefined;
  const out: TouchResult = { passed: true, burnCautionC: BURN_CAUTION_C, sinks: {} };
  for (const sink of doc.sinks) {
    const rule = doc.touch.sinks[sink.id];
    const verdict = checkTouch(sinks[sink.id].peakC, rule.limitC);
    const passed = !rule.accessible || verdict.passed;
    out.sinks[sink.id] = {
      sink: sink.id,
      accessible: rule.accessible,
      peakC: verdict.peakC,
      limitC: rule.limitC,
      ...(rule.material ? { material: rule.material } : {}),
      ...(rule.contact ? { contact: rule.contact } : {}),
      marginK: verdict.marginK,
      passed,
      burnCaution: verdict.burnCaution,
    };
    if (!passed) out.passed = false;
  }
  return out;
}
