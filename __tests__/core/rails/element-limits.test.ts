import { CELL_STATUS, compileRailPlan, dissipationMap, evaluateCell, highestCurrent, tapWorstCases } from '@/core/rails';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { regulator, tradePlan, tradeRange } from './trade-scenario';

const model = compileRailPlan(tradePlan);
// Demo foldback (invented): 3 A up to 10 V across the element, falling linearly to 1 A at 30 V.
const foldback = { ...regulator, currentLimit: [{ x: 10, y: 3 }, { x: 30, y: 1 }] };

describe('the element current limit in a rail plan (PHYSICS.md §1)', () => {
  it('finds the current where the foldback limit meets the load', () => {
    // Hand-worked: three in series give 37.77 − 0.3 I; at 20.45 V out the differential is
    // 17.32 − 0.3 I and the limit 3 − (d − 10)/10 = 2.268 + 0.03 I, so I = 2.268 / 0.97 = 2.33814 A.
    const h = highestCurrent(model.taps[2], foldback, 20.45, 5);
    expect(h.setBy).toBe('current-limit');
    assertInDelta(h.currentA, 2.268 / 0.97, 1e-9, 'limited current');
    const w = tapWorstCases(model, foldback, tradeRange).taps[2]!;
    assertInDelta(w.highestCurrentA, 2.268 / 0.97, 1e-9, 'worst-case current');
  });

  it('marks cells beyond the limit, not hiding them', () => {
    const cell = evaluateCell(model.taps[2], foldback, 20.45, 2.4);
    expect(CELL_STATUS[cell.status]).toBe('current-limit');
    expect(Number.isNaN(cell.powerW)).toBe(true);
    const map = dissipationMap(model, foldback, tradeRange, { vout: 12, iout: 6 });
    expect(Array.from(map.overall.status).some((s) => CELL_STATUS[s] === 'current-limit')).toBe(true);
  });

  it('sags the output in dropout and gives the power of the sagged output', () => {
    // Dropout against current (datasheet points): 1.5 V at 0 A to 2.5 V at 5 A.
    const el = { ...regulator, dropout: [{ x: 0, y: 1.5 }, { x: 5, y: 2.5 }] };
    // The parallel pair at 5 A gives 12.59 − 0.375 − 0.65 = 11.565 V; 10 V out needs 2.5 V: dropout.
    const cell = evaluateCell(model.taps[0], el, 10, 5);
    expect(CELL_STATUS[cell.status]).toBe('dropout');
    assertInDelta(cell.powerW, 2.5 * 5, 1e-12, 'P = Vdropout · I');
  });

  it('rejects a current-limit curve whose x does not rise', () => {
    const bad = { ...regulator, currentLimit: [{ x: 10, y: 3 }, { x: 10, y: 1 }] };
    expect(() => tapWorstCases(model, bad, tradeRange)).toThrow(/element\.currentLimit\[1\]\.x/);
    expect(() => tapWorstCases(model, regulator, { ...tradeRange, voutMaxV: 1 })).toThrow(/range\.voutMaxV/);
  });
});
