import { evaluateStudy, parseStudy } from '@/core/study';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { contractStudy } from './study-fixtures';

/** Two lumped devices (Rjc 0.5, Rcs 0.3) on one sink (Rsa 1.1, 180 J/K) at 40 °C. */
function pair(segments: object[], electrical?: object): Record<string, any> {
  const study = contractStudy();
  const device = (id: string) => ({
    id,
    tjMaxC: 150,
    sink: 'S1',
    package: { kind: 'lumped', rthKPerW: 0.5, capacityJPerK: 2 },
    interface: { rthKPerW: 0.3 },
    ...(electrical ? { electrical } : {}),
  });
  study.devices = [device('Q1'), device('Q2')];
  study.profile.segments = segments;
  return study;
}

describe('evaluateStudy electrical segments', () => {
  it('shares the load between the pass devices and dissipates (Vin − Vout)·I/n + Vin·Iq in each', () => {
    // PHYSICS.md §1: each of the two parts carries 1 A: (24 − 12)·1 + 24·0.005 = 12.12 W.
    const doc = parseStudy(pair([{ durationS: 20000, vinV: 24, voutV: 12, iloadA: 2 }], { iqA: 0.005 }));
    const r = evaluateStudy(doc);
    for (const id of ['Q1', 'Q2']) {
      assertInDelta(r.devices[id].peakPowerW, 12.12, 1e-12, `${id} P`);
      // Steady state, series–parallel sum: 40 + 12.12·(0.5 + 0.3) + 24.24·1.1.
      assertInDelta(r.devices[id].peakJunctionC, 40 + 12.12 * 0.8 + 24.24 * 1.1, 1e-6, `${id} Tj`);
    }
  });

  it('feeds only the devices listed on the segment', () => {
    const doc = parseStudy(pair([{ durationS: 10, vinV: 24, voutV: 12, iloadA: 2, devices: ['Q2'] }]));
    const r = evaluateStudy(doc);
    expect(r.devices.Q1.peakPowerW).toBe(0);
    // PHYSICS.md §1: all 2 A through Q2, (24 − 12)·2 = 24 W.
    assertInDelta(r.devices.Q2.peakPowerW, 24, 1e-12, 'Q2 P');
  });

  it('reports dropout with the sagged output and dissipates Vdropout·I', () => {
    // PHYSICS.md §1: Vout ≈ Vin − Vdropout; 1 A per part on a flat 1.2 V curve: 4.3 V out, 1.2 W per part.
    const electrical = { dropout: { points: [{ currentA: 0, voltageV: 1.2 }] } };
    const r = evaluateStudy(parseStudy(pair([{ durationS: 5, vinV: 5.5, voutV: 5, iloadA: 2 }, { durationS: 5, vinV: 12, voutV: 5, iloadA: 2 }], electrical)));
    expect(r.eventCounts.dropout).toBe(1);
    const ev = r.events.find((e) => e.kind === 'dropout')!;
    expect(ev).toMatchObject({ timeS: 0, endS: 5, devices: ['Q1', 'Q2'], requestedVoutV: 5 });
    if (ev.kind === 'dropout') assertInDelta(ev.voutV, 4.3, 1e-12, 'Vout');
    assertInDelta(r.devices.Q1.energyJ, 1.2 * 5 + 7 * 5, 1e-9, 'energy of one part');
  });

  it('clamps the load at the current limit and reports it', () => {
    // PHYSICS.md §1: I ≤ n·Ilim(Vin − Vout); 0.8 A per part at 19 V: (24 − 5)·1.6/2 = 15.2 W per part.
    const electrical = { currentLimit: { points: [{ differentialV: 0, currentA: 0.8 }] } };
    const r = evaluateStudy(parseStudy(pair([{ durationS: 3, vinV: 24, voutV: 5, iloadA: 3 }], electrical)));
    const ev = r.events.find((e) => e.kind === 'current-limit')!;
    expect(ev).toMatchObject({ kind: 'current-limit', requestedA: 3, deliveredA: 1.6, timeS: 0, endS: 3 });
    assertInDelta(r.devices.Q2.peakPowerW, 15.2, 1e-12, 'P');
  });

  it('joins a state that continues over consecutive segments into one event', () => {
    const electrical = { dropout: { points: [{ currentA: 0, voltageV: 1 }] } };
    const same = { vinV: 5.5, voutV: 5, iloadA: 1 };
    const r = evaluateStudy(parseStudy(pair([{ durationS: 2, ...same }, { durationS: 3, ...same }, { durationS: 1, vinV: 9, voutV: 5, iloadA: 1 }, { durationS: 1, ...same }], electrical)));
    const spans = r.events.filter((e) => e.kind === 'dropout').map((e) => [e.timeS, 'endS' in e ? e.endS : NaN]);
    expect(spans).toEqual([[0, 5], [6, 7]]);
  });
});
