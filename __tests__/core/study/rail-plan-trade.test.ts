import { evaluateStudy, parseStudy, type StudyEvent } from '@/core/study';
import { assertInDelta } from '../../helpers/assert-in-delta';

/**
 * The three-source trade facts, written as a study (demo values, invented): three equal
 * "12 V, 2.5 A" sources (Voc 12.59 V, Rs 0.1 Ω, so 12.34 V at 2.5 A) feed an adjustable
 * regulator with about 2 V dropout; the parallel pair has a 50 mΩ ballast and a 0.65 V
 * protection diode per branch. Thresholds 9.5 V and 20.5 V, 0.1 V hysteresis, the output sensed.
 */
function tradeStudy(o: { sensed?: string; ioutMaxA?: number } = {}): Record<string, any> {
  const source = (id: string) => ({ id, vocV: 12.59, rsOhm: 0.1, imaxA: 2.5 });
  const leaf = (id: string) => ({ kind: 'source', source: id });
  return {
    format: 'junctura-study',
    version: 1,
    title: 'Three sources, three taps (demo data)',
    ambient: { temperatureC: 40 },
    sinks: [{ id: 'S1', rthKPerW: 0.8, capacityJPerK: 300 }],
    devices: [
      {
        id: 'U1',
        kind: 'regulator',
        tjMaxC: 125,
        sink: 'S1',
        package: { kind: 'lumped', rthKPerW: 1.5, capacityJPerK: 2 },
        interface: { rthKPerW: 0.3 },
        electrical: { dropout: { points: [{ currentA: 0, voltageV: 2 }] }, adjustable: { r1Ohm: 330, r2Ohm: 10_000 } },
      },
    ],
    railPlan: {
      sources: [source('a'), source('b'), source('c')],
      taps: [
        { name: 'parallel pair', circuit: { kind: 'parallel', branches: [{ ...leaf('a'), diodeV: 0.65, ballastOhm: 0.05 }, { ...leaf('b'), diodeV: 0.65, ballastOhm: 0.05 }] } },
        { name: 'two in series', circuit: { kind: 'series', parts: [leaf('a'), leaf('b')] } },
        { name: 'three in series', circuit: { kind: 'series', parts: [leaf('a'), leaf('b'), leaf('c')] } },
      ],
      thresholdsV: [9.5, 20.5],
      hysteresisV: 0.1,
      sensed: o.sensed ?? 'output',
      relay: { breakTimeS: 2e-3, inputCapacitanceF: 4.7e-3 },
      map: { voutMinV: 1.25, voutMaxV: 35, ioutMaxA: o.ioutMaxA ?? 5 },
    },
    profile: {
      segments: [
        { label: 'two in series at 2.5 A', durationS: 60, voutV: 15, iloadA: 2.5 },
        { label: 'full divider at 2.5 A', durationS: 60, iloadA: 2.5 },
      ],
    },
  };
}

describe('the three-source trade through a study document', () => {
  const r = evaluateStudy(parseStudy(tradeStudy()), { seriesPoints: 0 });
  const rail = r.railPlan!;

  it('lets two sources in parallel supply at least 5 A and two in series 2.5 A (common practice)', () => {
    expect(rail.taps[0].capabilityA).toBeGreaterThanOrEqual(5);
    assertInDelta(rail.taps[1].capabilityA, 2.5, 1e-12, 'series capability');
  });

  it('feeds the regulator 24.68 V from two in series and about 37 V from three (common practice, measured)', () => {
    const [two, three] = rail.selection.segments;
    expect(two).toMatchObject({ tap: 1, tapName: 'two in series' });
    assertInDelta(two.vinV, 24.68, 1e-9, 'two in series at 2.5 A');
    expect(three).toMatchObject({ tap: 2, tapName: 'three in series' });
    assertInDelta(three.vinV, 37, 0.05, 'three in series at 2.5 A');
  });

  it('dissipates ≈ 38 W in two-in-series at 9.5 V out and ≈ 41 W in three-in-series at 20.5 V, at 2.5 A (common practice)', () => {
    // (24.68 − 9.5) × 2.5 ≈ 38 W and (37 − 20.5) × 2.5 ≈ 41 W; the lowest outputs also take off h/2.
    assertInDelta(rail.worst.taps[1]!.powerW, 38, 0.5, 'two in series');
    assertInDelta(rail.worst.taps[2]!.powerW, 41, 0.5, 'three in series');
    // Thresholds near 9.5 V and 20.5 V: the first is at its best value, the second below it, both safe.
    assertInDelta(rail.thresholds[0].bestV, 9.5, 0.1, 'best first threshold');
    expect(rail.thresholds.every((t) => t.safe)).toBe(true);
  });

  it('sets 1.25 (1 + 10000/330) ≈ 39 V by the divider but reaches about 35 V from the 37 V input: dropout sets the top (common practice)', () => {
    const adj = r.devices.U1.adjustable!;
    assertInDelta(adj.dividerV, 1.25 * (1 + 10_000 / 330), 1e-12, 'divider output (PHYSICS.md §1)');
    assertInDelta(adj.dividerV, 39, 0.5, 'about 39 V');
    expect(adj.top!.limitedBy).toBe('dropout');
    assertInDelta(adj.top!.reachableV, 35, 0.1, 'top of the range');
    const dropout = r.events.find((e): e is Extract<StudyEvent, { kind: 'dropout' }> => e.kind === 'dropout')!;
    expect(dropout.timeS).toBe(60);
    assertInDelta(dropout.requestedVoutV, adj.dividerV, 1e-12, 'asked for the divider output');
    assertInDelta(dropout.voutV, adj.top!.reachableV, 1e-12, 'reached');
  });

  it('chatters under heavy load with the output sensed; a light load or sensing the set point avoids it (common practice)', () => {
    expect(rail.chatter!.chatters).toBe(true);
    expect(r.warnings.some((w) => /chatter/.test(w) && /set point/.test(w))).toBe(true);
    const light = evaluateStudy(parseStudy(tradeStudy({ ioutMaxA: 0.2 })), { seriesPoints: 0 }).railPlan!;
    expect(light.chatter!.chatters).toBe(false);
    const setPoint = evaluateStudy(parseStudy(tradeStudy({ sensed: 'set-point' })), { seriesPoints: 0 }).railPlan!;
    expect(setPoint.chatter!.chatters).toBe(false);
  });
});
