import {
  BURN_CAUTION_C,
  TOUCH_LIMITS_C,
  checkTouch,
  convectionRatio,
  rsaAltitudeFactor,
  standardAtmosphere,
  touchLimitC,
} from '@/core/reliability';
import { AIR_300K, laminarPlateNusselt, rayleighNumber, verticalPlateNusselt } from '@/core/heatsink';
import { assertInDelta, assertInRelDelta } from '../../helpers/assert-in-delta';

describe('standardAtmosphere (U.S. Standard Atmosphere 1976, troposphere)', () => {
  it('matches the standard table at sea level, 1, 2, 3 and 5 km (geometric altitude)', () => {
    // U.S. Standard Atmosphere 1976, Table I (geometric altitude; values from memory, to the
    // digits given): T, p, ρ/ρ0. 2000 m: ρ/ρ0 ≈ 0.8217; 3000 m: ≈ 0.7423 (PHYSICS.md brief values).
    const table: [number, number, number, number][] = [
      [0, 288.15, 101325, 1],
      [1000, 281.651, 89876, 0.90748],
      [2000, 275.154, 79501, 0.82168],
      [3000, 268.659, 70121, 0.74225],
      [5000, 255.676, 54048, 0.60117],
    ];
    for (const [z, t, p, rho] of table) {
      const a = standardAtmosphere(z);
      assertInDelta(a.temperatureK, t, 2e-3, `T(${z} m)`);
      assertInRelDelta(a.pressurePa, p, 2e-5, `p(${z} m)`);
      assertInRelDelta(a.densityRatio, rho, 5e-5, `ρ/ρ0(${z} m)`);
    }
    assertInDelta(standardAtmosphere(2000).densityRatio, 0.8217, 1e-4, 'brief 2000 m');
    assertInDelta(standardAtmosphere(3000).densityRatio, 0.7423, 1e-4, 'brief 3000 m');
  });

  it('density follows the ideal gas law ρ = p·M/(R*·T) and the sea-level density 1.225 kg/m³', () => {
    const a = standardAtmosphere(1500);
    // The standard's ρ0 = 1.2250 kg/m³ is p0·M/(R*·T0) = 1.2250008 rounded.
    assertInRelDelta(a.densityKgPerM3, (a.pressurePa * 0.0289644) / (8.31432 * a.temperatureK), 1e-6, 'ρ');
    assertInRelDelta(standardAtmosphere(0).densityKgPerM3, 1.225, 1e-12, 'ρ0');
  });

  it('refuses altitudes outside the troposphere formula', () => {
    expect(() => standardAtmosphere(-600)).toThrow(/altitudeM/);
    expect(() => standardAtmosphere(12000)).toThrow(/altitudeM/);
  });
});

describe('convection at altitude (PHYSICS.md §5 correlations)', () => {
  // Air whose density is ratio × the 300 K table's: ν and α scale as 1/ρ (k, μ, Pr do not
  // depend on pressure; Incropera & DeWitt §6.5, ideal gas).
  const thinAir = (ratio: number) => ({ ...AIR_300K, nuM2PerS: AIR_300K.nuM2PerS / ratio, alphaM2PerS: AIR_300K.alphaM2PerS / ratio });

  it('natural convection (Churchill & Chu 1975, vertical plate): h ∝ ρ^(2n) with n the law on Ra', () => {
    // Ra = g β ΔT L³/(ν α) ∝ ρ²·ΔT, so a density ratio r acts like a rise ratio r² and the
    // density exponent of h is twice its rise exponent n: between 2 × 1/4 (laminar) and
    // 2 × 1/3 (turbulent) for the whole-range correlation.
    const ratio = standardAtmosphere(3000).pressureRatio;
    const ra0 = rayleighNumber(0.15, 40, 1 / 320);
    const ra = rayleighNumber(0.15, 40, 1 / 320, thinAir(ratio));
    assertInRelDelta(ra / ra0, ratio * ratio, 1e-12, 'Ra ∝ ρ²');
    assertInRelDelta(ra, rayleighNumber(0.15, 40 * ratio * ratio, 1 / 320), 1e-12, 'as a rise ratio r²');
    const densityExponent = Math.log(verticalPlateNusselt(ra) / verticalPlateNusselt(ra0)) / Math.log(ratio);
    const riseExponent = Math.log(verticalPlateNusselt(ra0 * 1.01) / verticalPlateNusselt(ra0)) / Math.log(1.01);
    expect(densityExponent).toBeGreaterThanOrEqual(0.5);
    expect(densityExponent).toBeLessThanOrEqual(2 / 3);
    assertInDelta(densityExponent, 2 * riseExponent, 0.01, 'twice the rise exponent');
    // The product's law with the sink's own rise exponent n: laminar n = 1/4 → ρ^0.5.
    assertInRelDelta(convectionRatio({ kind: 'natural', exponent: 0.25 }, ratio), Math.sqrt(ratio), 1e-12, 'ρ^0.5');
    assertInRelDelta(convectionRatio({ kind: 'natural', exponent: riseExponent }, ratio), verticalPlateNusselt(ra) / verticalPlateNusselt(ra0), 0.01, 'against the correlation');
  });

  it('forced laminar plate (Nu = 0.664 Re^(1/2) Pr^(1/3)): h ∝ ρ^(1/2) at one air speed', () => {
    const ratio = 0.7;
    const re0 = (2 * 0.1) / AIR_300K.nuM2PerS;
    const re = (2 * 0.1) / thinAir(ratio).nuM2PerS;
    assertInRelDelta(laminarPlateNusselt(re) / laminarPlateNusselt(re0), Math.sqrt(ratio), 1e-12, 'Nu ratio');
    assertInRelDelta(convectionRatio({ kind: 'forced' }, ratio), Math.sqrt(ratio), 1e-12, 'law');
  });

  it('turns into a factor on Rθsa, with a radiated share left alone', () => {
    // 2000 m at the study's own air temperature: ρ/ρ0 = p/p0 = 0.78462 → Rθsa × 1/√0.78462 = 1.12894.
    const ratio = standardAtmosphere(2000).pressureRatio;
    assertInDelta(ratio, 0.78462, 2e-5, 'p/p0 at 2000 m (1976 table 79,501 Pa)');
    const laminar = { kind: 'natural' as const, exponent: 0.25 };
    assertInRelDelta(rsaAltitudeFactor(laminar, ratio), 1.12894, 1e-4, 'factor');
    // 30 % radiated: 1/(0.3 + 0.7 × 0.885787) = 1/0.920051 = 1.08690.
    assertInRelDelta(rsaAltitudeFactor(laminar, ratio, 0.3), 1.0869, 1e-4, 'with radiation');
    expect(rsaAltitudeFactor(laminar, 1)).toBe(1);
    // Lower density always raises Rθsa, turbulent natural convection (n = 1/3) most.
    expect(rsaAltitudeFactor({ kind: 'natural', exponent: 1 / 3 }, ratio)).toBeGreaterThan(rsaAltitudeFactor(laminar, ratio));
    expect(() => rsaAltitudeFactor(laminar, ratio, 1)).toThrow(RangeError);
  });
});

describe('touch temperature', () => {
  it('limits fall with contact time and are lowest for metal (IEC 62368-1 touch table, from memory)', () => {
    for (const material of Object.keys(TOUCH_LIMITS_C) as (keyof typeof TOUCH_LIMITS_C)[]) {
      const row = TOUCH_LIMITS_C[material];
      expect(row.brief).toBeGreaterThanOrEqual(row.short);
      expect(row.short).toBeGreaterThanOrEqual(row.long);
      expect(row.long).toBeGreaterThanOrEqual(row.continuous);
      expect(row.brief).toBeGreaterThanOrEqual(TOUCH_LIMITS_C.metal.brief);
    }
    expect(touchLimitC('metal', 'brief')).toBe(60);
  });

  it('checks a peak against the limit and gives the burn caution at about 60 °C (common practice)', () => {
    expect(BURN_CAUTION_C).toBe(60);
    expect(checkTouch(55, 60)).toEqual({ peakC: 55, limitC: 60, marginK: 5, passed: true, burnCaution: false });
    const hot = checkTouch(72, 85);
    expect(hot.passed).toBe(true);
    expect(hot.burnCaution).toBe(true);
    expect(checkTouch(60, 60).passed).toBe(false);
  });
});
