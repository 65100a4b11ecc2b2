import {
  LESIT_MODEL,
  accelerationFactor,
  createArrheniusAverage,
  cyclesToFailure,
  lifeFromDamage,
  minerDamage,
  rainflow,
  repeatsPerDay,
  type RainflowCycles,
} from '@/core/reliability';
import { assertInDelta, assertInRelDelta } from '../../helpers/assert-in-delta';

const cycles = (rows: [number, number, number][]): RainflowCycles => ({
  length: rows.length,
  range: Float64Array.from(rows, (r) => r[0]),
  mean: Float64Array.from(rows, (r) => r[1]),
  count: Float64Array.from(rows, (r) => r[2]),
});

describe('power-cycling life Nf = A·ΔTj^(−α)·exp(Ea/(kB·Tjm)) (LESIT, Held et al. 1997, from memory)', () => {
  it('matches the formula worked by hand with the LESIT values', () => {
    // A = 640, α = 5, Ea = 78,000 J/mol ÷ 96,485.332 C/mol = 0.808413 eV, kB = 8.617e-5 eV/K
    // (PHYSICS.md §6). ΔTj = 50 K, Tjm = 80 °C = 353.15 K:
    // 640 × 50^−5 = 2.048e-6; Ea/(kB·Tjm) = 0.808413/(8.617e-5 × 353.15) = 26.5652;
    // e^26.5652 = 3.44548e11; Nf = 7.0563e5 cycles (hand, checked on a calculator).
    assertInRelDelta(LESIT_MODEL.activationEnergyEV, 0.808413, 1e-6, 'Ea');
    assertInRelDelta(cyclesToFailure(LESIT_MODEL, 50, 80), 7.0563e5, 1e-4, 'Nf(50 K, 80 °C)');
    // ΔTj = 80 K, Tjm = 100 °C: 640 × 80^−5 = 1.95313e-7; exponent 25.1215 → 8.2961e10; Nf = 1.6204e4.
    assertInRelDelta(cyclesToFailure(LESIT_MODEL, 80, 100), 1.6204e4, 1e-4, 'Nf(80 K, 100 °C)');
  });

  it('falls with the range as ΔT^−α and with the mean temperature', () => {
    // Coffin–Manson: doubling ΔTj divides Nf by 2^α = 32 at the same mean.
    assertInRelDelta(cyclesToFailure(LESIT_MODEL, 20, 70) / cyclesToFailure(LESIT_MODEL, 40, 70), 32, 1e-12, 'ratio');
    let last = Infinity;
    for (const range of [1, 5, 10, 30, 60, 100]) {
      const nf = cyclesToFailure(LESIT_MODEL, range, 70);
      expect(nf).toBeLessThan(last);
      last = nf;
    }
    expect(cyclesToFailure(LESIT_MODEL, 40, 120)).toBeLessThan(cyclesToFailure(LESIT_MODEL, 40, 60));
    expect(cyclesToFailure(LESIT_MODEL, 0, 60)).toBe(Infinity);
    expect(() => cyclesToFailure(LESIT_MODEL, -1, 60)).toThrow(RangeError);
  });

  it('Miner damage is linear: the sum of the classes, doubling counts doubles it', () => {
    // Palmgren–Miner (Miner, J. Appl. Mech. 12, 1945): D = Σ n_i / Nf,i.
    const a = cycles([[50, 80, 1]]);
    const b = cycles([[80, 100, 2]]);
    const both = cycles([
      [50, 80, 1],
      [80, 100, 2],
    ]);
    const dA = minerDamage(LESIT_MODEL, a);
    const dB = minerDamage(LESIT_MODEL, b);
    assertInRelDelta(dA, 1 / 7.0563e5, 1e-4, 'one cycle');
    assertInRelDelta(minerDamage(LESIT_MODEL, both), dA + dB, 1e-12, 'sum');
    assertInRelDelta(dB, 2 * minerDamage(LESIT_MODEL, cycles([[80, 100, 1]])), 1e-12, 'linear in count');
  });

  it('life in years from a mission: hours per day or repeats per day', () => {
    // One repeat of a 600 s history holding one 50 K cycle about 80 °C, 8 h a day:
    // 48 repeats a day, D/day = 48/7.0563e5, life = 7.0563e5/(48 × 365.25) = 40.25 years (hand).
    const d = minerDamage(LESIT_MODEL, cycles([[50, 80, 1]]));
    const perDay = repeatsPerDay({ kind: 'hours', hoursPerDay: 8 }, 600);
    expect(perDay).toBe(48);
    const life = lifeFromDamage(d, perDay);
    assertInRelDelta(life.years, 40.25, 1e-3, 'years');
    assertInRelDelta(life.repeatsToFailure, 7.0563e5, 1e-4, 'repeats');
    expect(repeatsPerDay({ kind: 'repeats', repeatsPerDay: 12 }, 600)).toBe(12);
    expect(lifeFromDamage(0, 48).years).toBe(Infinity);
  });

  it('a rainflow count of a square wave gives one damage per swing', () => {
    // 10 swings between 40 and 90 °C: 9.5 full-range cycles counted (ASTM E1049 residue halves
    // at the open ends), each ΔTj 50 K about 65 °C.
    const h = Array.from({ length: 20 }, (_, i) => (i % 2 === 0 ? 40 : 90));
    const c = rainflow(h);
    const counted = Array.from(c.count).reduce((s, n) => s + n, 0);
    assertInDelta(counted, 9.5, 1e-12, 'cycles');
    assertInRelDelta(minerDamage(LESIT_MODEL, c), 9.5 / cyclesToFailure(LESIT_MODEL, 50, 65), 1e-12, 'damage');
  });
});

describe('Arrhenius acceleration AF = exp[(Ea/kB)(1/Tuse − 1/Tstress)] (PHYSICS.md §6)', () => {
  it('is 1 at equal temperatures and matches a hand value', () => {
    expect(accelerationFactor(85, 85, 0.7)).toBe(1);
    // 0.7 eV, 55 °C → 125 °C: (0.7/8.617e-5) × (1/328.15 − 1/398.15) = 4.35228; e^4.35228 = 77.658 (hand).
    assertInRelDelta(accelerationFactor(55, 125, 0.7), 77.658, 1e-4, 'AF');
    assertInRelDelta(accelerationFactor(125, 55, 0.7), 1 / 77.658, 1e-4, 'inverse');
  });

  it('time-weights the factor over a history relative to the reference', () => {
    // Half the time at the reference (AF 1), half at 125 °C against 55 °C (AF 77.658), steps
    // joined by zero-length moves: mean (1 + 77.658)/2 = 39.329.
    const avg = createArrheniusAverage(55, 0.7);
    avg.add(0, 55);
    avg.add(100, 55);
    avg.add(100, 125);
    avg.add(200, 125);
    assertInRelDelta(avg.mean(), 39.329, 1e-4, 'mean AF');
    expect(avg.durationS()).toBe(200);
    const flat = createArrheniusAverage(40, 0.7);
    flat.add(0, 40);
    flat.add(10, 40);
    assertInDelta(flat.mean(), 1, 1e-12, 'at the reference');
    expect(() => flat.add(5, 40)).toThrow(RangeError);
  });
});
