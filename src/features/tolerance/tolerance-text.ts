import type { Probability, ToleranceResult } from '@/core/tolerance';

const pct = (p: number) => {
  const v = p * 100;
  if (v === 0) return '0 %';
  if (v < 0.1) return `${Number(v.toPrecision(2))} %`;
  return `${Number(v.toPrecision(3))} %`;
};

/** "2.9 % (95 % interval 1.8–4.6 %)". */
export function probabilityText(p: Probability): string {
  return `${pct(p.p)} (95 % interval ${pct(p.low).replace(' %', '')}–${pct(p.high)})`;
}

export const celsius = (c: number) => `${Number(c.toFixed(1))} °C`;

/** The one sentence that answers the sweep. */
export function headline(r: ToleranceResult): string {
  const runs = `${r.runs.toLocaleString('en')} ${r.mode === 'corners' ? (r.runs === 1 ? 'corner' : 'corners') : r.runs === 1 ? 'run' : 'runs'}`;
  if (r.mode === 'corners' && r.worstCorner) {
    const w = r.worstCorner;
    const margin = w.marginToTargetK >= 0 ? `${Number(w.marginToTargetK.toFixed(1))} K below its target` : `${Number((-w.marginToTargetK).toFixed(1))} K over its target`;
    return `Worst of ${runs}: ${w.device} peaks at ${celsius(w.peakC)}, ${margin}, with ${w.words}.`;
  }
  const t = r.anyExceedTarget;
  if (t.count === 0) return `No junction went above its target in ${runs}; the chance per build is below ${pct(t.high)} (95 % upper bound).`;
  return `A junction went above its target in ${t.count.toLocaleString('en')} of ${runs}: ${probabilityText(t)}.`;
}

export const METHOD_TEXT: Record<ToleranceResult['sensitivity']['method'], string> = {
  spearman: 'Spearman rank correlation between each input and the peak (−1…1); the longest bar drives the spread most.',
  'main-effect': 'Main effect over the corners: mean peak with the input at its high extreme minus at its low one, K.',
};

export const DISTRIBUTION_TEXT =
  'Rθjc, Rθsa, interface and share spreads follow the chosen distribution (normal: the ± is 3σ); ambient, line and load are uniform over their range.';
