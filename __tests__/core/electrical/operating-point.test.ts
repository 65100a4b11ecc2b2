import { interpolateLinear, solveOperatingPoint, type PassMember } from '@/core/electrical';
import { assertInDelta } from '../../helpers/assert-in-delta';

const plain = (count = 1, iqA = 0): PassMember => ({ count, iqA, on: true });

describe('solveOperatingPoint', () => {
  it('regulates with headroom: the output and current are as asked and P = (Vin − Vout)·I + Vin·Iq', () => {
    const op = solveOperatingPoint({ vinV: 24, voutV: 5, iloadA: 0.5 }, [{ ...plain(1, 0.005), dropout: [{ x: 0, y: 0.4 }, { x: 1, y: 1.4 }] }]);
    expect(op.inDropout).toBe(false);
    expect(op.currentLimited).toBe(false);
    // PHYSICS.md §1: (24 − 5)·0.5 + 24·0.005 = 9.62 W.
    assertInDelta(op.partPowerW[0], 9.62, 1e-12, 'P');
  });

  it('sags the output to Vin − Vdropout(I) without headroom and says so', () => {
    // PHYSICS.md §1: Vout ≈ Vin − Vdropout; dropout at 0.5 A on the line 0.4 → 1.4 V over 0–1 A is 0.9 V.
    const op = solveOperatingPoint({ vinV: 5.5, voutV: 5, iloadA: 0.5 }, [{ ...plain(), dropout: [{ x: 0, y: 0.4 }, { x: 1, y: 1.4 }] }]);
    expect(op.inDropout).toBe(true);
    assertInDelta(op.voutV, 4.6, 1e-12, 'Vout');
    assertInDelta(op.dropoutV, 0.9, 1e-12, 'Vdropout');
    // P = Vdropout · I = 0.45 W.
    assertInDelta(op.partPowerW[0], 0.45, 1e-12, 'P');
  });

  it('treats an input below the requested output as dropout to Vin when no dropout curve is given', () => {
    const op = solveOperatingPoint({ vinV: 4, voutV: 5, iloadA: 1 }, [plain()]);
    expect(op.inDropout).toBe(true);
    expect(op.voutV).toBe(4);
    expect(op.partPowerW[0]).toBe(0);
  });

  it('clamps the load at the foldback limit interpolated at Vin − Vout', () => {
    // PHYSICS.md §1: I ≤ Ilim(Vin − Vout); at 10 V between (5 V, 1.5 A) and (15 V, 1.1 A) the line gives 1.3 A.
    const limit = [{ x: 5, y: 1.5 }, { x: 15, y: 1.1 }, { x: 25, y: 0.45 }];
    const op = solveOperatingPoint({ vinV: 15, voutV: 5, iloadA: 2 }, [{ ...plain(), currentLimit: limit }]);
    expect(op.currentLimited).toBe(true);
    assertInDelta(op.currentA, 1.3, 1e-12, 'I');
    assertInDelta(op.partPowerW[0], 10 * 1.3, 1e-12, 'P');
  });

  it('shares the current equally among parallel parts, each drawing its own Iq', () => {
    // PHYSICS.md §1: each of n parts carries I/n; (30 − 10)·(3/3) + 30·0.01 = 20.3 W per part.
    const op = solveOperatingPoint({ vinV: 30, voutV: 10, iloadA: 3 }, [plain(2, 0.01), plain(1, 0.01)]);
    assertInDelta(op.partCurrentA, 1, 1e-15, 'I per part');
    op.partPowerW.forEach((p, k) => assertInDelta(p, 20.3, 1e-12, `P of member ${k}`));
  });

  it('moves the current of a part in thermal shutdown to the others; the tripped part draws only Iq', () => {
    const op = solveOperatingPoint({ vinV: 30, voutV: 10, iloadA: 3 }, [plain(2, 0.01), { ...plain(1, 0.01), on: false }]);
    assertInDelta(op.partCurrentA, 1.5, 1e-15, 'I per conducting part');
    assertInDelta(op.partPowerW[0], 20 * 1.5 + 0.3, 1e-12, 'P conducting');
    assertInDelta(op.partPowerW[1], 0.3, 1e-15, 'P tripped (Vin·Iq)');
  });

  it('turns the output off when every part is in shutdown', () => {
    const op = solveOperatingPoint({ vinV: 24, voutV: 5, iloadA: 1 }, [{ ...plain(1, 0.002), on: false }]);
    expect(op.outputOff).toBe(true);
    expect(op.currentA).toBe(0);
    assertInDelta(op.partPowerW[0], 24 * 0.002, 1e-15, 'P');
  });

  it('returns a point consistent with both the dropout and the limit curve when both act', () => {
    const dropout = [{ x: 0, y: 0.5 }, { x: 2, y: 2.5 }];
    const limit = [{ x: 0, y: 1.2 }, { x: 3, y: 0.8 }];
    const drive = { vinV: 6, voutV: 5, iloadA: 2 };
    const op = solveOperatingPoint(drive, [{ ...plain(), dropout, currentLimit: limit }]);
    // The definitions of PHYSICS.md §1 must hold together at the answer.
    assertInDelta(op.voutV, Math.min(drive.voutV, drive.vinV - interpolateLinear(dropout, op.currentA)), 1e-9, 'Vout = Vin − Vdropout(I)');
    assertInDelta(op.currentA, Math.min(drive.iloadA, interpolateLinear(limit, drive.vinV - op.voutV)), 1e-9, 'I = Ilim(Vin − Vout)');
    expect(op.inDropout && op.currentLimited).toBe(true);
  });
});
