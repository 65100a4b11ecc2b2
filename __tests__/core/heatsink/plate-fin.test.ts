import {
  plateFinCandidate,
  plateFinForced,
  plateFinNaturalAtPower,
  plateFinNaturalAtRise,
  rankSinks,
  scanFinCount,
  type PlateFinGeometry,
} from '@/core/heatsink';
import { assertNear, assertRelative } from './assert-near';

/** 100 mm × 100 mm base, 5 mm thick, 10 fins 30 mm × 2 mm, aluminium (k 200), anodised ε 0.85. */
const sink: PlateFinGeometry = {
  baseWidthM: 0.1,
  lengthM: 0.1,
  baseThicknessM: 0.005,
  finCount: 10,
  finHeightM: 0.03,
  finThicknessM: 0.002,
  material: 'aluminium',
  emissivity: 0.85,
};

describe('plateFinNaturalAtRise', () => {
  it('adds channel convection, fin efficiency, the outer faces and envelope radiation as worked by hand', () => {
    // 50 K over 25 °C, air at 300 K (Incropera Table A.4), β = 1/323.15 K⁻¹:
    //   s = (100 − 10 × 2)/9 = 8.8889 mm; El = 264.954; Nu_s = 2.32679 (Bar-Cohen & Rohsenow)
    //   h_ch = 2.32679 × 0.0263 / 0.0088889 = 6.88440 W/(m²K)
    //   h_out = 6.44852 (Churchill & Chu on L = 100 mm), h_end = (6.88440 + 6.44852)/2 = 6.66646
    //   Lc = 30 + 1 = 31 mm; η = tanh(mLc)/(mLc), m = √(2h/(k t)): η_ch = 0.989117, η_end = 0.989458
    //   fin area each 2 × 0.031 × 0.1 = 0.0062 m²; channel floors 9 × 0.0088889 × 0.1 = 0.008 m²
    //   G_conv = 6.88440 × 0.008 + 0.0062 (8 × 0.989117 × 6.88440 + 2 × 0.989458 × 6.66646) = 0.474618 W/K
    //   h_r = 0.85 σ (348.15² + 298.15²)(646.3) = 6.54477; envelope 0.01 + 0.007 + 0.007 = 0.024 m²
    //   G_rad = 0.157075 W/K → Rsa = 1/0.631693 = 1.58305 K/W.
    const r = plateFinNaturalAtRise(sink, 50);
    assertNear(r.spacingM * 1e3, 8.8889, 1e-4, 's');
    assertNear(r.channelHWPerM2K, 6.8844, 1e-4, 'h channel');
    assertNear(r.outerHWPerM2K, 6.44852, 1e-5, 'h outer');
    assertNear(r.finEfficiency, 0.989117, 1e-6, 'η');
    assertNear(r.convectionWPerK, 0.474618, 1e-5, 'G conv');
    assertNear(r.radiationWPerK, 0.157075, 1e-5, 'G rad');
    assertNear(r.rsaKPerW, 1.58305, 1e-5, 'Rsa');
  });

  it('states its assumptions and validity range beside the number', () => {
    const r = plateFinNaturalAtRise(sink, 50);
    expect(r.assumptions.join(' ')).toMatch(/vertical/i);
    expect(r.assumptions.join(' ')).toMatch(/isothermal base/i);
    expect(r.validity.map((v) => v.quantity)).toEqual(['Elenbaas number (set by the fin spacing)', 'Rayleigh number on the fin length', 'fin Biot number h (t/2)/k', 'fin height / spacing']);
    expect(r.withinRange).toBe(true);
  });

  it('flags a case outside the laminar range and narrow channels below the measured Elenbaas range', () => {
    // 1 m fins at 80 K: Ra_L ≈ 6e9 > 1e9 (turbulent, Incropera §9.6).
    const tall = plateFinNaturalAtRise({ ...sink, lengthM: 1 }, 80);
    expect(tall.validity.find((v) => v.quantity.startsWith('Rayleigh'))!.inRange).toBe(false);
    expect(tall.withinRange).toBe(false);
    // 40 fins of 1.5 mm on 100 mm: s = 1.03 mm, El ≈ 0.05.
    const dense = plateFinNaturalAtRise({ ...sink, finCount: 40, finThicknessM: 0.0015 }, 50);
    expect(dense.elenbaas).toBeLessThan(0.1);
    expect(dense.validity[0].inRange).toBe(false);
  });

  it('gets better with rise as laminar natural convection does', () => {
    // h ∝ ΔT^(1/4): Rsa falls with the rise (PHYSICS.md §3).
    expect(plateFinNaturalAtRise(sink, 80).rsaKPerW).toBeLessThan(plateFinNaturalAtRise(sink, 20).rsaKPerW);
  });

  it('names the field of bad geometry', () => {
    expect(() => plateFinNaturalAtRise({ ...sink, finCount: 60 }, 50)).toThrow('geometry.finCount: 60 fins of 2 mm do not fit');
    expect(() => plateFinNaturalAtRise({ ...sink, orientation: 'horizontal' as never }, 50)).toThrow('geometry.orientation');
    expect(() => plateFinNaturalAtRise({ ...sink, emissivity: 2 }, 50)).toThrow('geometry.emissivity');
    expect(() => plateFinNaturalAtRise({ ...sink, finCount: 1 }, 50)).toThrow('geometry.finCount: must be ≥ 2');
  });
});

describe('plateFinNaturalAtPower', () => {
  it('iterates the rise until ΔT = P · Rsa(ΔT)', () => {
    const r = plateFinNaturalAtPower(sink, 30);
    assertNear(r.riseK, 30 * plateFinNaturalAtRise(sink, r.riseK).rsaKPerW, 1e-5, 'ΔT = P Rsa(ΔT)');
    expect(r.riseK).toBeGreaterThan(40);
    expect(r.riseK).toBeLessThan(55);
  });
});

describe('scanFinCount', () => {
  it('puts the best fin count of the model next to the Bar-Cohen & Rohsenow optimum spacing', () => {
    // Thin, ideally conducting fins without radiation: the model is then the correlation the
    // optimum was derived from (plus the base floor and the outer faces), so its best count
    // must lie within one fin of the count whose spacing is nearest s_opt = 5.98 mm.
    const scan = scanFinCount({ ...sink, finThicknessM: 0.0002, conductivityWPerMK: 1e6, emissivity: 0, finHeightM: 0.05 }, 50);
    assertNear(scan.optimumSpacingM * 1e3, 5.9795, 1e-4, 's_opt');
    expect(Math.abs(scan.best.finCount - scan.finCountForOptimumSpacing)).toBeLessThanOrEqual(1);
    // And it is an interior optimum: fewer or more fins are worse.
    const at = (n: number) => scan.table.find((row) => row.finCount === n)!.rsaKPerW;
    expect(at(scan.best.finCount - 3)).toBeGreaterThan(scan.best.rsaKPerW);
    expect(at(scan.best.finCount + 3)).toBeGreaterThan(scan.best.rsaKPerW);
    expect(scan.assumptions[0]).toContain('Only the fin count varies');
    expect(scan.withinRange).toBe(true);
  });
});

describe('plateFinForced', () => {
  it('uses the laminar flat-plate h on every surface: 17.45 W/(m²K) at 2 m/s over 100 mm', () => {
    const r = plateFinForced(sink, 2);
    assertNear(r.hWPerM2K, 17.4535, 1e-4, 'h');
    // Warming air: Q = C (1 − e^(−hA/C)) with C = (k/α) v A_flow (Incropera §8.3).
    const capacityRate = (0.0263 / 22.5e-6) * 2 * 9 * (0.08 / 9) * 0.03;
    assertRelative(r.convectionWPerK, capacityRate * -Math.expm1(-r.surfaceConductanceWPerK / capacityRate), 1e-12, 'G conv');
    expect(r.convectionWPerK).toBeLessThan(Math.min(r.surfaceConductanceWPerK, capacityRate));
    expect(r.rsaKPerW).toBeLessThan(plateFinNaturalAtRise(sink, 50).rsaKPerW);
  });

  it('flags a flow that leaves the laminar range', () => {
    // 10 m/s along 1 m: Re = 6.3e5 > 5e5.
    const r = plateFinForced({ ...sink, lengthM: 1 }, 10);
    expect(r.reynolds).toBeGreaterThan(5e5);
    expect(r.validity[0].inRange).toBe(false);
  });
});

describe('plateFinCandidate', () => {
  it('gives a ranking candidate with its rating, law exponent, forced points and heat capacity from the volume', () => {
    // Metal: 0.1 × 0.1 × 0.005 + 10 × 0.002 × 0.03 × 0.1 = 1.1e-4 m³ → 0.297 kg (2700 kg/m³)
    // → 267.3 J/K (900 J/(kg·K)); bounding box 0.1 × 0.1 × 0.035 = 3.5e-4 m³.
    const { candidate, natural, forced } = plateFinCandidate(sink, { id: 'custom', airSpeedsMPerS: [1, 2, 4] });
    assertNear(candidate.massKg!, 0.297, 1e-12, 'mass');
    assertNear(candidate.capacityJPerK!, 267.3, 1e-9, 'C');
    assertNear(candidate.volumeM3!, 3.5e-4, 1e-15, 'volume');
    assertNear(candidate.natural!.rthKPerW, natural.rsaKPerW, 0, 'rating');
    // Laminar convection alone would give 1/4 (PHYSICS.md §3); radiation shifts it a little.
    assertNear(candidate.natural!.exponent!, 0.25, 0.03, 'exponent');
    expect(candidate.forcedAir!.map((p) => p.airSpeedMPerS)).toEqual([1, 2, 4]);
    expect(forced[1].rsaKPerW).toBeLessThan(forced[0].rsaKPerW);

    const ranking = rankSinks(
      {
        devices: [{ id: 'q1', tjMaxC: 150, package: { kind: 'lumped', rthKPerW: 0.5, capacityJPerK: 2 }, interfaceRthKPerW: 0.2 }],
        segments: [{ durationS: 600, powerW: { q1: 30 } }],
        ambientC: 25,
        marginK: 20,
      },
      [candidate],
    );
    expect(ranking.ranked[0].status).toBe('pass');
  });
});
