import { rankingSetupFromStudy, rankSinks, type SinkCandidate } from '@/core/heatsink';
import { parseStudy } from '@/core/study';
import { assertNear, assertRelative } from './assert-near';

/**
 * Ranking at the study's site altitude. A single device at a constant 40 W, periodic (the
 * profile held forever), so each junction sits at its steady value: the series sum
 * Tj = Ta + P·(Rjc + Rcs + Rsa) of the thermal resistances (textbook, common practice).
 */
const P = 40;
const RJC = 0.5;
const RCS = 0.3;
const TA = 30;
const TJMAX = 175;
const MARGIN = 10;

const study = (site?: Record<string, unknown>) =>
  parseStudy({
    format: 'junctura-study',
    version: 1,
    title: 'Ranking at altitude (demo data)',
    marginK: MARGIN,
    ambient: { temperatureC: TA },
    sinks: [{ id: 'HS', rthKPerW: 1.2 }],
    devices: [{ id: 'Q1', tjMaxC: TJMAX, sink: 'HS', package: { kind: 'foster', terms: [{ rKPerW: RJC, tauS: 0.01 }] }, interface: { rthKPerW: RCS } }],
    profile: { segments: [{ durationS: 600, powerW: { Q1: P } }], periodic: true },
    ...(site ? { site } : {}),
  });

// Demo catalogue: one fan-cooled sink (Rθsa 0.8 K/W at 2 m/s) and one still-air sink rated
// 1.1 K/W at a 60 K rise, laminar natural convection (n = 1/4).
const candidates: SinkCandidate[] = [
  { id: 'fan', forcedAir: [{ airSpeedMPerS: 1, rthKPerW: 1.1 }, { airSpeedMPerS: 2, rthKPerW: 0.8 }, { airSpeedMPerS: 4, rthKPerW: 0.6 }] },
  { id: 'still', natural: { rthKPerW: 1.1, referenceRiseK: 60, exponent: 0.25 } },
];

/**
 * Pressure ratio of the standard atmosphere's troposphere (U.S. Standard Atmosphere 1976 /
 * ISA): p/p0 = (1 − L·H/T0)^(g0·M/(R·L)), L = 0.0065 K/m, T0 = 288.15 K, exponent 5.2559, H the
 * geopotential altitude r0·z/(r0 + z), r0 = 6,356,766 m. At 1,800 m the standard tables give
 * about 81.5 kPa of 101.325 kPa, 0.804 (from memory).
 */
function isaPressureRatio(z: number) {
  const h = (6_356_766 * z) / (6_356_766 + z);
  return Math.pow(1 - (0.0065 * h) / 288.15, 5.2559);
}

describe('heatsink ranking at the study site', () => {
  it('ranks a forced-air candidate with its Rθsa derated: Tj = Ta + P(Rjc + Rcs + Rsa·factor)', () => {
    const { setup, options } = rankingSetupFromStudy(study({ altitudeM: 1800 }), 'HS');
    expect(options.site).toEqual({ altitudeM: 1800, radiationShare: 0 });
    const result = rankSinks(setup, candidates, { ...options, airSpeedMPerS: 2 });
    const ratio = isaPressureRatio(1800);
    assertNear(ratio, 0.804, 0.002, 'p/p0 at 1,800 m against the standard table');
    // Forced air over a laminar plate, h ∝ Re^(1/2) ∝ ρ^(1/2) (Incropera & DeWitt eq. 7.30):
    // Rθsa × 1/sqrt(ρ/ρ0), density ratio = pressure ratio at the study's own ambient.
    const factor = 1 / Math.sqrt(ratio);
    assertNear(factor, 1.115, 0.002, 'factor');
    // 1e-5: the exponent 5.2559 above is rounded to four decimals.
    assertNear(result.site!.forcedRsaFactor, factor, 1e-5, 'reported forced factor');
    assertNear(result.site!.rsaFactor, result.site!.forcedRsaFactor, 1e-12, 'reported factor (laminar natural = forced, both ρ^(1/2))');
    expect(result.site!.altitudeM).toBe(1800);
    const fan = result.ranked.find((r) => r.id === 'fan')!;
    assertNear(fan.siteFactor!, factor, 1e-5, 'candidate factor');
    assertNear(fan.rsaKPerW!, 0.8 * fan.siteFactor!, 1e-12, 'derated Rθsa');
    const tj = TA + P * (RJC + RCS + 0.8 * factor);
    assertNear(tj, 30 + 40 * (0.5 + 0.3 + 0.8 * 1.115), 0.01, 'hand sum, 97.7 °C');
    assertNear(fan.devices[0].peakC, tj, 1e-3, 'steady Tj at 1,800 m');
    assertNear(fan.steady!.marginK, TJMAX - MARGIN - tj, 1e-3, 'steady margin');
    expect(result.assumptions.join(' ')).toContain('1800 m');
  });

  it('derates a still-air candidate with the radiation share left alone: 1/(s + (1 − s)·sqrt(p/p0))', () => {
    const { setup, options } = rankingSetupFromStudy(study({ altitudeM: 1800, radiationShare: 0.2 }), 'HS');
    const result = rankSinks(setup, candidates, options);
    const factor = 1 / (0.2 + 0.8 * Math.sqrt(isaPressureRatio(1800)));
    const still = result.ranked.find((r) => r.id === 'still')!;
    assertNear(still.siteFactor!, factor, 1e-5, 'candidate factor');
    // Natural convection Rθsa = Rref·f·(ΔTref/ΔT)^n with ΔT = P·Rθsa gives, in closed form,
    // ΔT = (P·Rref·f)^(1/(1+n)) · ΔTref^(n/(1+n)) (h ∝ ΔT^n, laminar n = 1/4, common practice).
    const rise = Math.pow(P * 1.1 * factor, 1 / 1.25) * Math.pow(60, 0.25 / 1.25);
    assertNear(still.steady!.rsaKPerW, rise / P, 1e-5, 'steady Rθsa at the site');
    assertNear(still.steady!.marginK, TJMAX - MARGIN - (TA + P * (RJC + RCS) + rise), 1e-3, 'steady margin');
    // The profile run linearises at its mean rise to 1 % on Rθsa (CONVECTION_REL_TOL).
    assertRelative(still.rsaKPerW!, rise / P, 0.01, 'simulated Rθsa');
  });

  it('changes nothing at 0 m', () => {
    const sea = rankingSetupFromStudy(study(), 'HS');
    const zero = rankingSetupFromStudy(study({ altitudeM: 0 }), 'HS');
    const plain = rankSinks(sea.setup, candidates, { ...sea.options, airSpeedMPerS: 2 });
    const at0 = rankSinks(zero.setup, candidates, { ...zero.options, airSpeedMPerS: 2 });
    expect(at0.site!.rsaFactor).toBe(1);
    expect(at0.site!.pressureRatio).toBe(1);
    expect(plain.site).toBeUndefined();
    for (const id of ['fan', 'still']) {
      const a = plain.ranked.find((r) => r.id === id)!;
      const b = at0.ranked.find((r) => r.id === id)!;
      expect(b.siteFactor).toBe(1);
      expect(b.rsaKPerW).toBe(a.rsaKPerW);
      expect(b.devices).toEqual(a.devices);
      expect(b.steady).toEqual(a.steady);
    }
    const fan = plain.ranked.find((r) => r.id === 'fan')!;
    assertNear(fan.devices[0].peakC, TA + P * (RJC + RCS + 0.8), 1e-6, 'steady Tj at sea level');
  });

  it('refuses a site out of range, naming the field', () => {
    const { setup } = rankingSetupFromStudy(study(), 'HS');
    expect(() => rankSinks(setup, candidates, { site: { altitudeM: 20_000 } })).toThrow(/^options\.site\.altitudeM: must lie/);
    expect(() => rankSinks(setup, candidates, { site: { altitudeM: 100, radiationShare: 1 } })).toThrow(/^options\.site\.radiationShare/);
  });
});
