import { flatPlateAtPower, flatPlateAtRise } from '@/core/heatsink';
import { assertNear } from './assert-near';

describe('flatPlateAtRise', () => {
  const board = { heightM: 0.1, widthM: 0.1, thicknessM: 35e-6, material: 'copper' as const, emissivity: 0.9 };

  it('sheds from both faces by Churchill & Chu plus radiation', () => {
    // 100 mm × 100 mm vertical plate at 50 K over 25 °C: h = 6.44852 W/(m²K) (Churchill & Chu,
    // air at 300 K), h_r = 6.92976 (ε 0.9, Incropera eq. 1.9); two faces of 0.01 m²:
    // Rsa = 1/((6.44852 + 6.92976) × 0.02) = 3.73740 K/W.
    const r = flatPlateAtRise(board, 50);
    assertNear(r.convectionHWPerM2K, 6.44852, 1e-5, 'h');
    assertNear(r.radiationHWPerM2K, 6.92976, 1e-5, 'h_r');
    assertNear(r.rsaKPerW, 3.7374, 1e-4, 'Rsa');
    assertNear(flatPlateAtRise({ ...board, faces: 1 }, 50).rsaKPerW, 2 * 3.7374, 2e-4, 'one face');
  });

  it('flags thin copper as far from isothermal and a thick plate as close to it', () => {
    // 35 µm copper, 50 mm from the centre line: m = √(2 × 13.378/(401 × 35e-6)) = 43.66 m⁻¹,
    // mL = 2.18 → η = tanh(2.18)/2.18 = 0.447 (fin approximation, Incropera §3.6).
    const thin = flatPlateAtRise(board, 50);
    assertNear(thin.spreadingEfficiency, 0.4466, 1e-3, 'η thin');
    expect(thin.withinRange).toBe(false);
    expect(thin.rsaWithSpreadingKPerW).toBeGreaterThan(thin.rsaKPerW);
    const plate = flatPlateAtRise({ ...board, thicknessM: 0.003, material: 'aluminium' }, 50);
    expect(plate.spreadingEfficiency).toBeGreaterThan(0.9);
    expect(plate.withinRange).toBe(true);
    expect(thin.assumptions.join(' ')).toMatch(/isothermal/i);
  });

  it('holds the heat capacity of its metal', () => {
    // 0.1 × 0.1 × 35e-6 m³ × 8933 kg/m³ × 385 J/(kg·K) = 1.20372 J/K (Incropera Table A.1, from memory).
    assertNear(flatPlateAtRise(board, 50).capacityJPerK, 1.20372, 1e-5, 'C');
  });

  it('solves the rise at a given power', () => {
    const r = flatPlateAtPower(board, 5);
    assertNear(r.riseK, 5 * flatPlateAtRise(board, r.riseK).rsaKPerW, 1e-5, 'ΔT = P Rsa(ΔT)');
  });

  it('names the field of bad input', () => {
    expect(() => flatPlateAtRise({ ...board, faces: 3 as never }, 50)).toThrow('geometry.faces: must be 1 or 2');
    expect(() => flatPlateAtRise({ ...board, heightM: 0 }, 50)).toThrow('geometry.heightM: must be > 0');
  });
});
