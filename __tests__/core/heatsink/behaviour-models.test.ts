import {
  capacityFromMass,
  convectionExponentFromRatings,
  capacityFromVolume,
  forcedAirRsa,
  massFromVolume,
  naturalConvectionRsa,
  naturalConvectionSteady,
  radiationCoefficient,
  MIN_CONVECTION_RISE_K,
} from '@/core/heatsink';
import { assertNear, assertRelative } from './assert-near';

describe('naturalConvectionRsa', () => {
  it('scales a rating as (ΔTref/ΔT)^(1/4) for laminar natural convection', () => {
    // PHYSICS.md §3 (h ∝ ΔT^(1/4), Incropera & DeWitt ch. 9): 2 K/W at 75 K, at 30 K:
    // 2 × (75/30)^0.25 = 2 × 1.257433 = 2.514866 K/W.
    assertNear(naturalConvectionRsa(2, 75, 30), 2 * Math.pow(2.5, 0.25), 1e-12, 'Rsa(30 K)');
    assertNear(naturalConvectionRsa(2, 75, 30), 2.514866, 1e-6, 'Rsa(30 K), hand value');
  });

  it('returns the rating itself at the reference rise and any exponent', () => {
    assertNear(naturalConvectionRsa(1.5, 50, 50, 0.33), 1.5, 1e-15, 'Rsa at ΔTref');
  });

  it('holds the value at MIN_CONVECTION_RISE_K below it instead of growing without bound', () => {
    assertNear(naturalConvectionRsa(1, 50, 0), naturalConvectionRsa(1, 50, MIN_CONVECTION_RISE_K), 0, 'Rsa at 0 K');
  });

  it('names the field of a bad argument', () => {
    expect(() => naturalConvectionRsa(-1, 50, 10)).toThrow('rsaRefKPerW: must be > 0');
    expect(() => naturalConvectionRsa(1, 50, 10, 2)).toThrow('exponent: must lie in 0…1');
  });
});

describe('convectionExponentFromRatings', () => {
  it('recovers n from two ratings of one sink on the law Rθ(ΔT) = Rθref (ΔTref/ΔT)^n', () => {
    // Laminar, n = 1/4 (Incropera & DeWitt ch. 9): 2 K/W at 75 K reads 2.514866 K/W at 30 K
    // (the hand value above), so ln(2.514866/2) / ln(75/30) = 0.25.
    assertNear(convectionExponentFromRatings({ rthKPerW: 2.514866, riseK: 30 }, { rthKPerW: 2, riseK: 75 }), 0.25, 1e-6, 'laminar n');
    // Turbulent natural convection, Nu ∝ Ra^(1/3), so h ∝ ΔT^(1/3) (Incropera & DeWitt ch. 9,
    // from memory): 1.5 K/W at 50 K reads 1.5 × 2^(1/3) = 1.889882 K/W at 25 K (hand value).
    assertNear(convectionExponentFromRatings({ rthKPerW: 1.5, riseK: 50 }, { rthKPerW: 1.889882, riseK: 25 }), 1 / 3, 1e-6, 'turbulent n');
  });

  it('gives the same n in either order, and n outside 0…1 as found', () => {
    const a = { rthKPerW: 1.2, riseK: 40 };
    const b = { rthKPerW: 0.95, riseK: 80 };
    assertNear(convectionExponentFromRatings(a, b), convectionExponentFromRatings(b, a), 1e-15, 'order');
    // Rθsa rising with the rise: a negative n, left for the caller to refuse.
    expect(convectionExponentFromRatings({ rthKPerW: 1, riseK: 40 }, { rthKPerW: 1.1, riseK: 80 })).toBeLessThan(0);
  });

  it('names the field of a bad rating', () => {
    expect(() => convectionExponentFromRatings({ rthKPerW: 1, riseK: 50 }, { rthKPerW: 0.8, riseK: 50 })).toThrow('b.riseK: must differ from a.riseK');
    expect(() => convectionExponentFromRatings({ rthKPerW: -1, riseK: 50 }, { rthKPerW: 0.8, riseK: 60 })).toThrow('a.rthKPerW: must be > 0');
  });
});

describe('naturalConvectionSteady', () => {
  it('solves ΔT = Rsa(ΔT)·P in closed form', () => {
    // 1.2 K/W at 75 K, 40 W: ΔT = (1.2 × 75^0.25 × 40)^(1/1.25) = 52.48138 K (hand, from the formula),
    // so Rsa = 1.312034 K/W; it must also satisfy the law at that rise.
    const { riseK, rsaKPerW } = naturalConvectionSteady(1.2, 75, 40);
    assertNear(riseK, 52.48138, 1e-4, 'rise');
    assertNear(rsaKPerW, 1.312034, 1e-6, 'Rsa');
    assertNear(rsaKPerW, naturalConvectionRsa(1.2, 75, riseK), 1e-12, 'fixed point');
  });

  it('gives zero rise with no power', () => {
    expect(naturalConvectionSteady(1, 75, 0).riseK).toBe(0);
  });
});

describe('forcedAirRsa', () => {
  // Laminar forced convection gives h ∝ v^(1/2) (Nu = 0.664 Re^(1/2) Pr^(1/3), PHYSICS.md §5),
  // so points taken from R = 3 v^(−1/2) must be reproduced exactly in between.
  const law = (v: number) => 3 / Math.sqrt(v);
  const points = [1, 2, 5].map((v) => ({ airSpeedMPerS: v, rthKPerW: law(v) }));

  it('is exact on a power law between points', () => {
    for (const v of [1.3, 2, 3.7, 4.99]) assertRelative(forcedAirRsa(points, v).rthKPerW, law(v), 1e-12, `R(${v})`);
    expect(forcedAirRsa(points, 3).range).toBe('inside');
  });

  it('holds the end values outside the points and flags them', () => {
    expect(forcedAirRsa(points, 0.5)).toEqual({ rthKPerW: law(1), range: 'below' });
    expect(forcedAirRsa(points, 8)).toEqual({ rthKPerW: law(5), range: 'above' });
  });

  it('rejects points out of order, naming the point', () => {
    expect(() => forcedAirRsa([{ airSpeedMPerS: 2, rthKPerW: 1 }, { airSpeedMPerS: 1, rthKPerW: 2 }], 1)).toThrow('points[1].airSpeedMPerS');
  });
});

describe('radiationCoefficient', () => {
  it('matches ε σ (Ts² + T∞²)(Ts + T∞) and the net exchange εσ(Ts⁴ − T∞⁴) it linearises', () => {
    // Incropera & DeWitt eq. 1.9, σ = 5.670374419e-8 W/(m²K⁴) (CODATA 2018): ε = 0.9,
    // Ts = 75 °C = 348.15 K, T∞ = 25 °C = 298.15 K:
    // 0.9 σ (348.15² + 298.15²)(646.3) = 6.92976 W/(m²K).
    const hr = radiationCoefficient(0.9, 75, 25);
    assertNear(hr, 6.92976, 1e-5, 'hr');
    const sigma = 5.670374419e-8;
    assertRelative(hr * 50, 0.9 * sigma * (348.15 ** 4 - 298.15 ** 4), 1e-12, 'q″');
  });

  it('rejects an emissivity above 1', () => {
    expect(() => radiationCoefficient(1.2, 50, 25)).toThrow('emissivity');
  });
});

describe('sink heat capacity', () => {
  it('is mass × cp with Incropera Table A.1 values', () => {
    // Incropera & DeWitt Table A.1 (from memory): copper cp = 385 J/(kg·K); aluminium alloys ≈ 900.
    assertNear(capacityFromMass(0.25, 'copper'), 96.25, 1e-12, 'C copper');
    assertNear(capacityFromMass(0.5, 'aluminium'), 450, 1e-12, 'C aluminium');
  });

  it('is volume × density × cp', () => {
    // 100 cm³ of aluminium: 1e-4 m³ × 2700 kg/m³ = 0.27 kg, × 900 = 243 J/K.
    assertNear(massFromVolume(1e-4, 'aluminium'), 0.27, 1e-12, 'm');
    assertNear(capacityFromVolume(1e-4, 'aluminium'), 243, 1e-9, 'C');
    // Copper, Table A.1: 8933 kg/m³ × 385 J/(kg·K) × 1e-5 m³ = 34.392 J/K.
    assertNear(capacityFromVolume(1e-5, 'copper'), 34.39205, 1e-5, 'C copper');
  });

  it('names an unknown material', () => {
    expect(() => capacityFromMass(1, 'brass' as never)).toThrow('material: must be one of aluminium, copper');
  });
});
