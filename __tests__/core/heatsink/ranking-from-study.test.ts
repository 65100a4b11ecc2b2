import { rankingSetupFromStudy, rankSinks } from '@/core/heatsink';
import { evaluateStudy, parseStudy } from '@/core/study';
import { assertNear } from './assert-near';

/** A small study (demo data): two devices on one sink, straight to ambient, three passes. */
const study = (extra: Record<string, unknown> = {}) =>
  parseStudy({
    format: 'junctura-study',
    version: 1,
    title: 'Ranking adapter check (demo data)',
    marginK: 25,
    ambient: { temperatureC: 35 },
    sinks: [{ id: 'HS', rthKPerW: 1.4, capacityJPerK: 300 }],
    devices: [
      { id: 'Q1', tjMaxC: 150, sink: 'HS', package: { kind: 'foster', terms: [{ rKPerW: 0.2, tauS: 0.01 }, { rKPerW: 0.6, tauS: 0.5 }] }, interface: { rthKPerW: 0.3 } },
      { id: 'Q2', tjMaxC: 175, sink: 'HS', count: 2, package: { kind: 'cauer', stages: [{ rKPerW: 0.4, capacityJPerK: 0.1 }, { rKPerW: 0.8, capacityJPerK: 2 }] }, interface: { rthKPerW: 0.5 } },
    ],
    profile: {
      segments: [
        { durationS: 40, powerW: { Q1: 25, Q2: 6 } },
        { durationS: 80, powerW: { Q1: 3 } },
      ],
      repeat: 3,
    },
    ...extra,
  });

describe('rankingSetupFromStudy', () => {
  it('takes the devices, margin, ambient and expanded passes of the sink slot', () => {
    const { setup, options } = rankingSetupFromStudy(study(), 'HS');
    expect(setup.devices.map((d) => d.id)).toEqual(['Q1', 'Q2']);
    expect(setup.devices[1].count).toBe(2);
    expect(setup.segments).toHaveLength(6);
    expect(setup.ambientC).toBe(35);
    expect(setup.marginK).toBe(25);
    expect(options).toEqual({});
  });

  it('gives the study pipeline’s own peaks when the study’s sink is ranked', () => {
    // Cross-check against the study evaluation (a separate solver path over the same
    // physics): the sink has a constant Rθsa, so both solve the same linear network.
    const doc = study();
    const { setup, options } = rankingSetupFromStudy(doc, 'HS');
    const ranking = rankSinks(setup, [{ id: 'HS', natural: { rthKPerW: 1.4, referenceRiseK: 50, exponent: 0 }, capacityJPerK: 300 }], options);
    const evaluated = evaluateStudy(doc, { seriesPoints: 0 });
    for (const d of ranking.ranked[0].devices) assertNear(d.peakC, evaluated.devices[d.id].peakJunctionC, 1e-4, `peak ${d.id}`);
  });

  it('refuses a slot it cannot model, naming the field', () => {
    expect(() => rankingSetupFromStudy(study(), 'XX')).toThrow('sinkId: the study has no sink "XX"');
    const chassis = study({ sinks: [{ id: 'HS', rthKPerW: 1.4, capacityJPerK: 300, to: 'CH' }, { id: 'CH', rthKPerW: 0.5 }] });
    expect(() => rankingSetupFromStudy(chassis, 'HS')).toThrow('sinks.HS.to: leads to sink "CH"; ranking models a sink that leads to the ambient or to the enclosure air');
    expect(() => rankingSetupFromStudy(chassis, 'CH')).toThrow('sinks.HS.to: is mounted on "CH"');
  });

  it('leaves out the powers of devices on other sinks', () => {
    // Per-part powers as an evaluation gives them, for every device of the study.
    const doc = study({
      sinks: [{ id: 'HS', rthKPerW: 1.4, capacityJPerK: 300 }, { id: 'H2', rthKPerW: 2 }],
      devices: [
        { id: 'Q1', tjMaxC: 150, sink: 'HS', package: { kind: 'lumped', rthKPerW: 0.8 }, interface: { rthKPerW: 0.3 } },
        { id: 'Q2', tjMaxC: 150, sink: 'HS', package: { kind: 'lumped', rthKPerW: 1.2 }, interface: { rthKPerW: 0.5 } },
        { id: 'Q9', tjMaxC: 150, sink: 'H2', package: { kind: 'lumped', rthKPerW: 1 }, interface: { rthKPerW: 0.2 } },
      ],
    });
    const { setup } = rankingSetupFromStudy(doc, 'HS', [{ durationS: 10, powerW: { Q1: 4, Q2: 1, Q9: 7 } }]);
    expect(setup.segments[0].powerW).toEqual({ Q1: 4, Q2: 1 });
    expect(() => rankSinks(rankingSetupFromStudy(doc, 'HS', [{ durationS: 10, powerW: { Q7: 1 } }]).setup, [])).toThrow('setup.segments[0].powerW.Q7: no device has the id "Q7"');
  });

  it('holds a varying ambient at its highest value and says so', () => {
    const doc = study({ ambient: { profile: [{ timeS: 0, temperatureC: 20 }, { timeS: 100, temperatureC: 45 }] } });
    const { setup, notes } = rankingSetupFromStudy(doc, 'HS');
    expect(setup.ambientC).toBe(45);
    expect(notes.join(' ')).toContain('highest value');
  });
});
