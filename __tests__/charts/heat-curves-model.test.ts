import { heatCurvesModel } from '@/charts/heat-curves-model';
import { evaluateStudy, parseStudy } from '@/core/study';

/** Two devices with different limits on one sink, in an enclosure. */
const doc = parseStudy({
  format: 'junctura-study',
  version: 1,
  title: 'Two devices',
  marginK: 25,
  ambient: { temperatureC: 30 },
  enclosure: { rthKPerW: 1, capacityJPerK: 50 },
  sinks: [{ id: 'HS1', rthKPerW: 1.5, capacityJPerK: 200 }],
  devices: [
    { id: 'Q1', tjMaxC: 150, sink: 'HS1', package: { kind: 'lumped', rthKPerW: 1 }, interface: { rthKPerW: 0.5 } },
    { id: 'Q2', tjMaxC: 175, sink: 'HS1', package: { kind: 'lumped', rthKPerW: 1 }, interface: { rthKPerW: 0.5 } },
  ],
  profile: { segments: [{ durationS: 600, powerW: { Q1: 5, Q2: 8 } }] },
});

describe('heat-curves model', () => {
  const result = evaluateStudy(doc);
  const model = heatCurvesModel(result);

  it('orders the series device by device, then sinks, then the air', () => {
    expect(model.curves.map((c) => c.label)).toEqual(['Q1 junction', 'Q1 case', 'Q2 junction', 'Q2 case', 'HS1 sink', 'Enclosure air', 'Ambient']);
  });

  it('tells every kind of node apart by its line pattern, not by colour alone', () => {
    // Colour must not be the only visual means of telling items apart (WCAG 2.1, SC 1.4.1).
    const byKind = new Map(model.curves.map((c) => [c.kind, c.style.dash ?? 'solid']));
    expect(new Set(byKind.values()).size).toBe(byKind.size);
    const [q1j, q1c, q2j] = model.curves;
    expect(q1j.style.stroke).toBe(q1c.style.stroke);
    expect(q1j.style.stroke).not.toBe(q2j.style.stroke);
  });

  it('marks the exact peaks from the solver, not the decimated points', () => {
    const q2 = model.curves.find((c) => c.key === 'Q2.junction')!;
    expect(q2.peak).toEqual({ timeS: result.devices.Q2.peakTimeS, valueC: result.devices.Q2.peakJunctionC });
    expect(model.curves.find((c) => c.key === 'ambient')!.peak).toBeUndefined();
  });

  it('draws one line per distinct Tj,max and target, naming the devices when they differ', () => {
    // Target = Tj,max − margin (study format): 150 − 25 = 125 °C and 175 − 25 = 150 °C.
    expect(model.limits.map((l) => [l.kind, l.valueC, l.label])).toEqual([
      ['tjMax', 150, 'Tj,max 150\u00a0°C (Q1)'],
      ['tjMax', 175, 'Tj,max 175\u00a0°C (Q2)'],
      ['target', 125, 'Target 125\u00a0°C (Q1)'],
      ['target', 150, 'Target 150\u00a0°C (Q2)'],
    ]);
  });
});
