import { passDissipationW } from '@/core/electrical';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('passDissipationW', () => {
  it('gives (Vin − Vout)·I + Vin·Iq for a regulator with quiescent current', () => {
    // PHYSICS.md §1 (textbook): (24 − 12)·2 + 24·0.005 = 24 + 0.12 = 24.12 W.
    assertInDelta(passDissipationW(24, 12, 2, 0.005), 24.12, 1e-12, 'P');
  });

  it('gives Vin·Iq alone when no load current flows', () => {
    // PHYSICS.md §1 with I = 0: 15 V · 0.01 A = 0.15 W.
    assertInDelta(passDissipationW(15, 5, 0, 0.01), 0.15, 1e-15, 'P');
  });

  it('gives the element drop times the current for an electronic load with no drive current', () => {
    // PHYSICS.md §1: the element drops what the source gives above the load side, (30 − 0.4)·8 = 236.8 W.
    assertInDelta(passDissipationW(30, 0.4, 8, 0), 236.8, 1e-12, 'P');
  });
});
