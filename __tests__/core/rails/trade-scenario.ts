import type { PassElement, RailPlan } from '@/core/rails';

/**
 * Demo scenario (invented values): three equal "12 V, 2.5 A" sources feeding an adjustable
 * regulator through relays. Voc 12.59 V and Rs 0.1 Ω are chosen so that a source gives
 * 12.34 V at 2.5 A, which reproduces the regulator inputs of the trade facts: 24.68 V with two
 * in series and ≈ 37 V with three. Parallel branches: 50 mΩ ballast and a 0.65 V protection
 * diode each. Dropout 2 V (the trade fact's "about 2 V").
 */
export const source = (id: string) => ({ id, vocV: 12.59, rsOhm: 0.1, imaxA: 2.5 });
export const leaf = (id: string) => ({ kind: 'source' as const, source: id });

export const tradePlan: RailPlan = {
  sources: [source('a'), source('b'), source('c')],
  taps: [
    {
      name: 'parallel pair',
      circuit: {
        kind: 'parallel',
        branches: [
          { ...leaf('a'), diodeV: 0.65, ballastOhm: 0.05 },
          { ...leaf('b'), diodeV: 0.65, ballastOhm: 0.05 },
        ],
      },
    },
    { name: 'two in series', circuit: { kind: 'series', parts: [leaf('a'), leaf('b')] } },
    { name: 'three in series', circuit: { kind: 'series', parts: [leaf('a'), leaf('b'), leaf('c')] } },
  ],
  thresholdsV: [9.5, 20.5],
  hysteresisV: 0.1,
  sensed: 'output',
};

export const regulator: PassElement = { iqA: 0, dropout: 2 };

/** Output from the 1.25 V reference up to 35 V, loads up to the 5 A of the parallel pair. */
export const tradeRange = { voutMinV: 1.25, voutMaxV: 35, ioutMaxA: 5 };
