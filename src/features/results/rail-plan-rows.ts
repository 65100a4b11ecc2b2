import type { RailPlanResult, TapSegment, TapWorstCase } from '@/core/study';
import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

/** One row of the worst-case table: a tap (or the whole plan) with the given and the best thresholds. */
export type WorstRow = {
  key: string;
  name: string;
  note?: string;
  /** The threshold above this tap, given and best, V (none for the top tap and the overall row). */
  threshold: { givenV: number; bestV: number; safe: boolean } | null;
  given: TapWorstCase | null;
  best: TapWorstCase | null;
};

/** Per tap, then overall: the threshold that ends the tap and its worst dissipation either way. */
export function worstRows(plan: RailPlanResult): WorstRow[] {
  const rows: WorstRow[] = plan.taps.map((tap, k) => {
    const t = plan.thresholds.find((th) => th.index === k);
    return {
      key: `tap${k}`,
      name: `Tap ${k + 1}, ${tap.name}`,
      note: `${formatQuantity(tap.openCircuitV, 'V')} open circuit, up to ${formatQuantity(tap.capabilityA, 'A')}`,
      threshold: t ? { givenV: t.givenV, bestV: t.bestV, safe: t.safe } : null,
      given: plan.worst.taps[k] ?? null,
      best: plan.worstWithBest.taps[k] ?? null,
    };
  });
  rows.push({ key: 'overall', name: 'Whole plan', threshold: null, given: plan.worst.overall, best: plan.worstWithBest.overall });
  return rows;
}

/** "84.5 W at 21.2 V, 3 A" (the output and current of a worst case), or "none". */
export function worstText(w: TapWorstCase | null): string {
  if (!w) return 'none';
  return `${formatQuantity(w.powerW, 'W')} at ${formatQuantity(w.voutV, 'V')}, ${formatQuantity(w.currentA, 'A')}`;
}

/** What sets a worst case's current, and whether the output is regulated there. */
export function worstNote(w: TapWorstCase | null): string | undefined {
  if (!w) return undefined;
  const setBy = { capability: 'the tap’s capability', range: 'the top of the range', 'current-limit': 'the current limit' }[w.setBy];
  return `${formatQuantity(w.vinV, 'V')} in; current set by ${setBy}${w.status === 'ok' ? '' : `; ${w.status.replace('-', ' ')}`}`;
}

/** The required Rθsa sentence, or null when the plan has none (nothing dissipated). */
export function requiredRsaText(plan: RailPlanResult): string | null {
  const r = plan.requiredRsa;
  if (!r) return null;
  const value = (v: number | null) => (v === null ? 'any sink' : v <= 0 ? 'no sink can do it' : `Rθsa ≤ ${formatQuantity(v, 'K/W')}`);
  return `Required: ${value(r.givenKPerW)} with the thresholds given, ${value(r.bestKPerW)} with the best ones (${plan.device} alone on its sink, ${formatQuantity(r.ambientC, '°C')} ambient, target Tj ${formatQuantity(r.tjTargetC, '°C')}).`;
}

/** One block of the tap strip: a run of segments on one tap, as fractions of the pass. */
export type StripBlock = { key: string; tap: number; tapName: string; start: number; width: number; fromS: number; toS: number };

/**
 * The first pass's segments as blocks along the time axis, neighbouring segments on the same
 * tap merged; fractions of the time the listed segments cover.
 */
export function tapStrip(segments: readonly TapSegment[]): StripBlock[] {
  if (segments.length === 0) return [];
  const t0 = segments[0].timeS;
  const last = segments[segments.length - 1];
  const span = last.timeS + last.durationS - t0;
  if (!(span > 0)) return [];
  const blocks: StripBlock[] = [];
  for (const s of segments) {
    const prev = blocks[blocks.length - 1];
    if (prev && prev.tap === s.tap && Math.abs(prev.toS - s.timeS) < 1e-9 * span) {
      prev.toS = s.timeS + s.durationS;
      prev.width = (prev.toS - prev.fromS) / span;
      continue;
    }
    blocks.push({ key: `${s.index}`, tap: s.tap, tapName: s.tapName, fromS: s.timeS, toS: s.timeS + s.durationS, start: (s.timeS - t0) / span, width: s.durationS / span });
  }
  return blocks;
}

/** "24 V in, 21.5 V out at 3 A" for a segment of the selection. */
export function segmentText(s: TapSegment): string {
  return `${formatQuantity(s.vinV, 'V')} in, ${formatQuantity(s.voutV, 'V')} out at ${formatQuantity(s.currentA, 'A')}`;
}

/** The threshold cell: "21.5 V / best 21.2 V". */
export function thresholdText(t: WorstRow['threshold']): string {
  return t ? `${formatQuantity(t.givenV, 'V')} / ${formatNumber(t.bestV)}\u00a0V` : '—';
}
