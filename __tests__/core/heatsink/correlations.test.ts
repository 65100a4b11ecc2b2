import {
  elenbaasNumber,
  finEfficiency,
  laminarBoundaryLayerM,
  laminarPlateNusselt,
  optimumPlateSpacing,
  parallelPlateNusselt,
  rayleighNumber,
  verticalPlateNusselt,
} from '@/core/heatsink';
import { assertNear, assertRelative } from './assert-near';

// Air at 300 K, Incropera & DeWitt Table A.4 (PHYSICS.md §5): k 0.0263 W/(m·K),
// ν 15.89e-6 m²/s, α 22.5e-6 m²/s, Pr 0.707; g = 9.80665 m/s² (standard gravity).
// Film temperature for a 50 K rise over 25 °C: 50 °C = 323.15 K, β = 1/323.15 K⁻¹.
const beta = 1 / 323.15;

describe('parallelPlateNusselt (Bar-Cohen & Rohsenow 1984)', () => {
  it('follows [576/El² + 2.873/El^(1/2)]^(−1/2) on a worked case', () => {
    // s = 8.889 mm, L = 100 mm, 50 K: El = g β ΔT s⁴/(ν α L) = 264.954 (hand, from the formula
    // with the values above); Nu = (576/264.954² + 2.873/√264.954)^(−1/2)
    //   = (0.0082051 + 0.1765051)^(−1/2) = 2.32679.
    const El = elenbaasNumber(0.08 / 9, 0.1, 50, beta);
    assertRelative(El, 264.954, 1e-5, 'El');
    assertNear(parallelPlateNusselt(El), 2.32679, 1e-5, 'Nu_s');
  });

  it('tends to the fully developed limit El/24 as El → 0', () => {
    // Elenbaas (1942) narrow-channel limit, the composite's first term alone; the relative
    // departure is about 2.873 El^(3/2) / 1152 (8e-8 at El = 1e-3).
    for (const El of [1e-4, 1e-3]) assertRelative(parallelPlateNusselt(El), El / 24, 1e-7, `Nu(${El})`);
    assertRelative(parallelPlateNusselt(1e-2), 1e-2 / 24, 3e-6, 'Nu(0.01)');
  });

  it('tends to the isolated-plate limit 0.59 El^(1/4) as El → ∞', () => {
    // Isolated vertical plate, laminar: Nu = 0.59 Ra^(1/4) (Elenbaas; Incropera & DeWitt eq. 9.24);
    // the composite gives 1/√2.873 = 0.58997.
    for (const El of [1e8, 1e10]) {
      assertRelative(parallelPlateNusselt(El) / Math.pow(El, 0.25), 1 / Math.sqrt(2.873), 1e-9, `Nu(${El})/El^¼`);
      assertNear(parallelPlateNusselt(El) / Math.pow(El, 0.25), 0.59, 1e-3, `coefficient at ${El}`);
    }
  });
});

describe('optimumPlateSpacing', () => {
  it('is the maximum of the heat per base area the composite correlation gives', () => {
    // Q per base area ∝ Nu_s/s² ∝ Nu(El)/El^(1/2) at fixed L and ΔT (El ∝ s⁴): a golden-section
    // search over El must land at El^(1/4) ≈ 2.714, Bar-Cohen & Rohsenow's coefficient.
    const f = (lnEl: number) => parallelPlateNusselt(Math.exp(lnEl)) / Math.exp(lnEl / 2);
    let a = Math.log(1);
    let b = Math.log(1e4);
    const g = (Math.sqrt(5) - 1) / 2;
    for (let i = 0; i < 200; i++) {
      const c = b - g * (b - a);
      const d = a + g * (b - a);
      if (f(c) > f(d)) b = d;
      else a = c;
    }
    const coefficient = Math.exp((a + b) / 8);
    assertRelative(coefficient, 2.714, 1e-3, 'El_opt^(1/4)');
  });

  it('gives 2.714 (L ν α/(g β ΔT))^(1/4): 5.980 mm for 100 mm fins at 50 K', () => {
    // 2.714 × (0.1 × 15.89e-6 × 22.5e-6 × 323.15 / (9.80665 × 50))^(1/4) = 2.714 × 2.2032 mm = 5.9795 mm.
    assertNear(optimumPlateSpacing(0.1, 50, beta) * 1e3, 5.9795, 1e-4, 's_opt, mm');
  });
});

describe('verticalPlateNusselt (Churchill & Chu 1975)', () => {
  it('gives the worked 100 mm × 100 mm plate at a 50 K rise', () => {
    // Ra_L = 9.80665 × 50 × 0.1³ / (323.15 × 15.89e-6 × 22.5e-6) = 4.24405e6;
    // [1 + (0.492/0.707)^(9/16)]^(8/27) = 1.193275; Ra^(1/6) = 12.72419;
    // Nu = (0.825 + 0.387 × 12.72419 / 1.193275)² = (0.825 + 4.12666)² = 24.5191;
    // h = 24.5191 × 0.0263 / 0.1 = 6.44852 W/(m²·K).
    const ra = rayleighNumber(0.1, 50, beta);
    assertRelative(ra, 4.24405e6, 1e-5, 'Ra_L');
    const nu = verticalPlateNusselt(ra);
    assertNear(nu, 24.5191, 1e-4, 'Nu_L');
    assertNear((nu * 0.0263) / 0.1, 6.44852, 1e-5, 'h');
  });

  it('tends to 0.825² = 0.6806 with no buoyancy', () => {
    assertNear(verticalPlateNusselt(0), 0.825 ** 2, 1e-15, 'Nu(0)');
  });
});

describe('laminarPlateNusselt', () => {
  it('gives 0.664 Re^(1/2) Pr^(1/3): 2 m/s along 100 mm', () => {
    // Re = 2 × 0.1 / 15.89e-6 = 12586.5; Nu = 0.664 × 112.1897 × 0.890854 = 66.3632;
    // h = 66.3632 × 0.0263 / 0.1 = 17.4535 W/(m²·K) (Incropera & DeWitt eq. 7.30).
    const re = (2 * 0.1) / 15.89e-6;
    assertNear(laminarPlateNusselt(re), 66.3632, 1e-4, 'Nu');
    assertNear((laminarPlateNusselt(re) * 0.0263) / 0.1, 17.4535, 1e-4, 'h');
  });

  it('gives the Blasius thickness 5x/Re^(1/2)', () => {
    // 5 × 0.1 / 112.1897 = 4.4567 mm.
    assertNear(laminarBoundaryLayerM(0.1, 12586.5) * 1e3, 4.4567, 1e-4, 'δ, mm');
  });
});

describe('finEfficiency', () => {
  it('gives tanh(mL)/(mL) on a worked fin', () => {
    // h = 10 W/(m²K), k = 200 W/(mK), t = 2 mm, L = 30 mm: m = √(2·10/(200·0.002)) = 7.07107 m⁻¹,
    // mL = 0.212132, tanh(0.212132)/0.212132 = 0.985265 (Incropera & DeWitt §3.6).
    assertNear(finEfficiency(10, 200, 0.002, 0.03), 0.985265, 1e-6, 'η');
  });

  it('tends to 1 as mL → 0 and falls as the fin gets longer', () => {
    assertNear(finEfficiency(1e-9, 400, 0.003, 0.01), 1, 1e-12, 'η at tiny h');
    assertNear(finEfficiency(0, 200, 0.002, 0.05), 1, 0, 'η at h = 0');
    // mL = 1: tanh(1) = 0.761594.
    const h = 0.5 * 200 * 0.002 * (1 / 0.05) ** 2;
    assertNear(finEfficiency(h, 200, 0.002, 0.05), Math.tanh(1), 1e-12, 'η at mL = 1');
    expect(finEfficiency(10, 200, 0.002, 0.06)).toBeLessThan(finEfficiency(10, 200, 0.002, 0.03));
  });
});
