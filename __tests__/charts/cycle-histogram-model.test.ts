import { countDomain, cycleBars, shareText } from '@/charts/cycle-histogram-model';
import { evaluateStudy, parseStudy } from '@/core/study';
import { cyclesText, lifeText } from '@/features/results/lifetime-text';
import { singleRcStudy } from '../core/study/study-fixtures';

describe('cycle histogram model', () => {
  it('draws one bar per non-empty bin, spanning the bin edges, with the count on a nice axis', () => {
    const bars = cycleBars({ edgesK: [0, 5, 10, 15], counts: [4, 0, 0.5], damageShare: [0.2, 0, 0.8] });
    expect(bars).toEqual([
      { fromK: 0, toK: 5, count: 4, damageShare: 0.2 },
      { fromK: 10, toK: 15, count: 0.5, damageShare: 0.8 },
    ]);
    expect(countDomain(bars)).toEqual([0, 4]);
    expect(countDomain([{ fromK: 0, toK: 1, count: 462, damageShare: 1 }])).toEqual([0, 500]);
    expect(shareText(0.163)).toBe('16\u00a0%');
    expect(shareText(0.004)).toBe('<1\u00a0%');
  });

  it('bins a solved pulse train: its one cycle per period falls in the bin of the exact swing', () => {
    // Periodic pulses into one RC (R 5 K/W, τ 10 s): swing (high − low) with high = P R (1 − e^(−tp/τ))/(1 − e^(−T/τ))
    // and low = high·e^(−(T − tp)/τ) (PHYSICS.md §3): 20 W, 2 s of 10 s → 31.72 K.
    const study = singleRcStudy({ rjc: 1.5, rcs: 0.5, rsa: 3, c: 2, ta: 25, segments: [{ durationS: 2, powerW: { U1: 20 } }, { durationS: 8, powerW: {} }] });
    study.profile.periodic = true;
    const life = evaluateStudy(parseStudy({ ...study, lifetime: { mission: { hoursPerDay: 1 } } })).lifetime!.devices.U1;
    const high = (100 * (1 - Math.exp(-0.2))) / (1 - Math.exp(-1));
    const swing = high * (1 - Math.exp(-0.8));
    const bars = cycleBars(life.histogram);
    expect(bars).toHaveLength(1);
    expect(bars[0].fromK).toBeLessThanOrEqual(swing);
    expect(bars[0].toK).toBeGreaterThan(swing);
    expect(bars[0]).toMatchObject({ count: 1, damageShare: 1 });
  });
});

describe('lifetime wording', () => {
  it('gives a life to two significant digits in years, months or days', () => {
    expect(lifeText(51.317)).toBe('51 years');
    expect(lifeText(1.04)).toBe('1 year');
    expect(lifeText(0.5876)).toBe('7.1 months');
    expect(lifeText(0.5)).toBe('6 months');
    expect(lifeText(0.01)).toBe('3.7 days');
    expect(lifeText(null)).toBe('no damaging temperature cycles');
    expect(cyclesText(2498743.5)).toBe('2,500,000');
  });
});
