import { evaluateStudy, parseStudy, type StudyEvent } from '@/core/study';
import { assertInDelta } from '../../helpers/assert-in-delta';

type TapEvent = Extract<StudyEvent, { kind: 'tap-change' }>;

/**
 * A regulator (no dropout) fed by a 12 V source alone (tap 0) or two in series (tap 1); the
 * comparator switches at θ = 8 V with h = 1 V. Sources are stiff (Rs = 0) so Vin is exact.
 */
function study(segments: object[], o: { sensed?: string; repeat?: number; periodic?: boolean; dropoutV?: number } = {}): Record<string, any> {
  return {
    format: 'junctura-study',
    version: 1,
    title: 'Tap selection',
    ambient: { temperatureC: 25 },
    sinks: [{ id: 'S1', rthKPerW: 1, capacityJPerK: 100 }],
    devices: [
      {
        id: 'U1',
        kind: 'regulator',
        tjMaxC: 150,
        sink: 'S1',
        package: { kind: 'lumped', rthKPerW: 1, capacityJPerK: 1 },
        interface: { rthKPerW: 0.2 },
        electrical: o.dropoutV === undefined ? {} : { dropout: { points: [{ currentA: 0, voltageV: o.dropoutV }] } },
      },
    ],
    railPlan: {
      sources: [
        { id: 'A', vocV: 12, rsOhm: 0, imaxA: 3 },
        { id: 'B', vocV: 12, rsOhm: 0, imaxA: 3 },
      ],
      taps: [
        { name: 'one source', circuit: { kind: 'source', source: 'A' } },
        { name: 'two in series', circuit: { kind: 'series', parts: [{ kind: 'source', source: 'A' }, { kind: 'source', source: 'B' }] } },
      ],
      thresholdsV: [8],
      hysteresisV: 1,
      sensed: o.sensed ?? 'set-point',
      map: { voutMinV: 0, voutMaxV: 20, ioutMaxA: 1 },
    },
    profile: { segments, repeat: o.repeat ?? 1, periodic: o.periodic ?? false },
  };
}

/** Set point ramped up from 6.05 V to 9.95 V and back in 0.1 V steps of 1 s, light load. */
const ramp = (): { durationS: number; voutV: number; iloadA: number }[] => {
  const up = Array.from({ length: 40 }, (_, k) => 6.05 + 0.1 * k);
  return [...up, ...[...up].reverse()].map((v) => ({ durationS: 1, voutV: Number(v.toFixed(2)), iloadA: 0.1 }));
};

const tapEvents = (events: StudyEvent[]) => events.filter((e): e is TapEvent => e.kind === 'tap-change');

describe('tap selection over a profile (PHYSICS.md §2)', () => {
  it.each(['set-point', 'output'])('switches up above θ + h/2 and down below θ − h/2 on a rising and falling set point (%s sensed)', (sensed) => {
    const segments = ramp();
    const r = evaluateStudy(parseStudy(study(segments, { sensed })), { seriesPoints: 0 });
    const [up, down] = tapEvents(r.events);
    // PHYSICS.md §2: up to tap k+1 above θk + h/2, down below θk − h/2: the first set points past 8.5 V and 7.5 V.
    const firstUp = segments.findIndex((s) => s.voutV > 8.5);
    const firstDown = segments.findIndex((s, i) => i > 40 && s.voutV < 7.5);
    expect(up).toMatchObject({ timeS: firstUp, from: 0, to: 1, fromName: 'one source', toName: 'two in series', sensedV: segments[firstUp].voutV });
    expect(down).toMatchObject({ timeS: firstDown, from: 1, to: 0, sensedV: segments[firstDown].voutV });
    expect(segments[firstUp - 1].voutV).toBeLessThanOrEqual(8.5);
    expect(tapEvents(r.events)).toHaveLength(2);
    // Inside the band the tap depends on the way in: 8.05 V is on tap 0 going up and on tap 1 coming down.
    const taps = r.railPlan!.selection.segments;
    const at805 = taps.filter((s) => Math.abs(s.voutV - 8.05) < 1e-9).map((s) => s.tap);
    expect(at805).toEqual([0, 1]);
    // Vin is the tap's voltage: 12 V or 24 V with stiff sources (PHYSICS.md §2, series voltages add).
    expect(new Set(taps.map((s) => s.vinV))).toEqual(new Set([12, 24]));
  });

  it('dissipates (Vtap − Vout)·I on the selected tap (PHYSICS.md §1)', () => {
    const r = evaluateStudy(parseStudy(study([{ durationS: 100, voutV: 5, iloadA: 1 }, { durationS: 100, voutV: 10, iloadA: 1 }])), { seriesPoints: 0 });
    // 5 V from 12 V: 7 W; 10 V from 24 V: 14 W.
    assertInDelta(r.devices.U1.peakPowerW, 14, 1e-12, 'peak power');
    assertInDelta(r.devices.U1.energyJ, 7 * 100 + 14 * 100, 1e-9, 'energy');
  });

  it('senses the output actually reached: in dropout below θ + h/2 it stays on the low tap (common practice)', () => {
    // From 5 V on tap 0, 10 V asked from 12 V with 3.6 V dropout reaches 8.4 V: above θ but below θ + h/2, so no switch.
    const segments = [{ durationS: 5, voutV: 5, iloadA: 1 }, { durationS: 10, voutV: 10, iloadA: 1 }];
    const r = evaluateStudy(parseStudy(study(segments, { sensed: 'output', dropoutV: 3.6 })), { seriesPoints: 0 });
    expect(tapEvents(r.events)).toHaveLength(0);
    expect(r.railPlan!.selection.segments[1]).toMatchObject({ tap: 0, vinV: 12 });
    assertInDelta(r.railPlan!.selection.segments[1].voutV, 8.4, 1e-12, 'output reached');
    expect(r.events.some((e) => e.kind === 'dropout')).toBe(true);
    // Sensing the set point instead switches (and the dropout goes away).
    const s = evaluateStudy(parseStudy(study(segments, { dropoutV: 3.6 })), { seriesPoints: 0 });
    expect(s.railPlan!.selection.segments[1].tap).toBe(1);
    expect(tapEvents(s.events).map((e) => e.timeS)).toEqual([5]);
    expect(s.events.some((e) => e.kind === 'dropout')).toBe(false);
  });

  it('carries the tap across passes: a later pass starts where the one before ended', () => {
    // 8 V lies inside the band: without history it is tap 0 (not above θ), after a 9 V segment tap 1.
    const segments = [{ durationS: 5, voutV: 8, iloadA: 0.1 }, { durationS: 5, voutV: 9, iloadA: 0.1 }];
    const r = evaluateStudy(parseStudy(study(segments, { repeat: 3 })), { seriesPoints: 0 });
    // Pass 1: 8 V on tap 0, up at 5 s; passes 2 and 3 stay on tap 1, 8 V now from 24 V.
    expect(tapEvents(r.events).map((e) => e.timeS)).toEqual([5]);
    // PHYSICS.md §1: (Vin − Vout)·I, 0.1 A: 4·5 on tap 0, then 15·5 three times and 16·5 twice, × 0.1 A.
    assertInDelta(r.devices.U1.energyJ, 0.1 * (4 * 5 + 15 * 5 * 3 + 16 * 5 * 2), 1e-9, 'energy over three passes');
    expect(r.durationS).toBe(30);
  });

  it('starts a periodic state on the tap the period ends with, and logs the change at the period start', () => {
    const segments = [{ durationS: 5, voutV: 9, iloadA: 0.1 }, { durationS: 5, voutV: 7, iloadA: 0.1 }, { durationS: 5, voutV: 8, iloadA: 0.1 }];
    const r = evaluateStudy(parseStudy(study(segments, { periodic: true })), { seriesPoints: 0 });
    // 9 V: tap 1; 7 V: down to 0; 8 V: stays 0, so the period ends on 0 and goes up at its start.
    expect(tapEvents(r.events).map((e) => [e.timeS, e.to])).toEqual([[0, 1], [5, 0]]);
  });
});
