import { naturalConvectionSteady, rankingSetupFromStudy, rankSinks, type SinkCandidate } from '@/core/heatsink';
import { evaluateStudy, parseStudy } from '@/core/study';
import { assertNear, assertRelative } from './assert-near';

/**
 * Ranking a sink that leads to the air of an enclosure (demo data): two devices on one sink
 * inside a housing, Rθ 0.8 K/W from its air to the room and 400 J/K of air and walls.
 *   Q1: Foster 0.2 + 0.6 K/W (Rjc 0.8), interface 0.3 K/W, Tj,max 150 °C.
 *   Q2: two parts, Cauer 0.4 + 0.8 K/W (Rjc 1.2), interface 0.5 K/W, Tj,max 175 °C.
 * Ambient 30 °C, margin 20 K: targets 130 °C and 155 °C.
 */
const RENC = 0.8;
const TA = 30;

const raw = (extra: Record<string, unknown> = {}, sink: Record<string, unknown> = {}) => ({
    format: 'junctura-study',
    version: 1,
    title: 'Ranking inside an enclosure (demo data)',
    marginK: 20,
    ambient: { temperatureC: TA },
    enclosure: { rthKPerW: RENC, capacityJPerK: 400 },
    sinks: [{ id: 'HS', rthKPerW: 0.9, capacityJPerK: 250, ...sink }],
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
// JSON drops the fields a case sets to undefined.
const study = (extra: Record<string, unknown> = {}, sink: Record<string, unknown> = {}) => parseStudy(JSON.parse(JSON.stringify(raw(extra, sink))));

/** A constant Rθsa: exponent 0 makes the rating independent of the rise. */
const constant = (id: string, rsa: number, capacityJPerK: number): SinkCandidate => ({ id, natural: { rthKPerW: rsa, referenceRiseK: 50, exponent: 0 }, capacityJPerK });

describe('ranking setup for a sink that leads to the enclosure', () => {
  it('takes the enclosure air with its Rθ and capacity, and says so in a note', () => {
    const { setup, notes } = rankingSetupFromStudy(study(), 'HS');
    expect(setup.enclosure).toEqual({ rthKPerW: RENC, capacityJPerK: 400 });
    const note = notes.find((n) => n.includes('enclosure air'));
    expect(note).toContain('0.8 K/W');
    expect(note).toContain('400 J/K');
  });

  it('takes the enclosure’s Rθ at the study’s site, as the study’s own evaluation does', () => {
    const doc = study({ site: { altitudeM: 2000, radiationShare: 0.1 } });
    const { setup, options, notes } = rankingSetupFromStudy(doc, 'HS');
    const evaluated = evaluateStudy(doc, { seriesPoints: 0 });
    // Laminar natural convection on the enclosure, h ∝ ρ^(1/2): 1/(s + (1 − s)·sqrt(p/p0)),
    // p/p0 = 0.7846 at 2,000 m (U.S. Standard Atmosphere 1976; the study format's own figure
    // is 0.785): 1/(0.1 + 0.9 × 0.88578) = 1.1169.
    assertNear(setup.enclosure!.rthKPerW, evaluated.site!.enclosure!.usedRthKPerW, 1e-12, 'enclosure Rθ at the site');
    assertNear(setup.enclosure!.rthKPerW / RENC, 1 / (0.1 + 0.9 * Math.sqrt(0.7846)), 1e-3, 'site factor on the enclosure');
    // The candidates are derated by the ranking itself (options.site), the enclosure only once.
    expect(options.site).toEqual({ altitudeM: 2000, radiationShare: 0.1 });
    const result = rankSinks(setup, [constant('c', 0.9, 250)], options);
    assertNear(result.enclosure!.rthKPerW, setup.enclosure!.rthKPerW, 0, 'enclosure Rθ ranked with');
    expect(notes.join(' ')).toContain('as given');
  });

  it('refuses a second sink in the same enclosure, naming its field', () => {
    const two = (to?: string) =>
      parseStudy({
        ...raw(),
        sinks: [{ id: 'HS', rthKPerW: 0.9 }, { id: 'HS2', rthKPerW: 2, ...(to ? { to } : {}) }, { id: 'CH', rthKPerW: 0.5, to: 'ambient' }],
        devices: [
          { id: 'Q1', tjMaxC: 150, sink: 'HS', package: { kind: 'lumped', rthKPerW: 0.8 }, interface: { rthKPerW: 0.3 } },
          { id: 'Q3', tjMaxC: 150, sink: 'HS2', package: { kind: 'lumped', rthKPerW: 0.8 }, interface: { rthKPerW: 0.3 } },
        ],
        profile: { segments: [{ durationS: 10, powerW: { Q1: 5, Q3: 5 } }] },
      });
    expect(() => rankingSetupFromStudy(two(), 'HS')).toThrow(/^sinks\.HS2\.to: also leads to the enclosure, whose air it would heat too/);
    expect(() => rankingSetupFromStudy(two('CH'), 'HS')).not.toThrow();
    expect(() => rankingSetupFromStudy(two('HS'), 'HS')).toThrow(/^sinks\.HS2\.to: is mounted on "HS"/);
    expect(() => rankingSetupFromStudy(two('HS'), 'HS2')).toThrow(/^sinks\.HS2\.to: leads to sink "HS"/);
  });

  it('refuses a bad enclosure given to the ranking directly, naming the field', () => {
    const { setup } = rankingSetupFromStudy(study(), 'HS');
    expect(() => rankSinks({ ...setup, enclosure: { rthKPerW: 0 } }, [])).toThrow('setup.enclosure.rthKPerW: must be > 0, got 0');
    expect(() => rankSinks({ ...setup, enclosure: { rthKPerW: 1, capacityJPerK: -5 } }, [])).toThrow('setup.enclosure.capacityJPerK: must be ≥ 0');
  });
});

describe('ranking inside an enclosure, steady state by hand', () => {
  // Constant powers held forever (periodic profile of one segment): every node sits at its
  // steady value, the series sum Tj = Ta + P_total·Renc + P_total·Rsa + P·(Rjc + Rcs)
  // (thermal resistances in series, common practice). P_total = 20 + 2 × 5 = 30 W, Rsa 0.9 K/W:
  //   enclosure air 30 + 30 × 0.8 = 54 °C, sink 54 + 30 × 0.9 = 81 °C,
  //   Q1: 81 + 20 × (0.8 + 0.3) = 103 °C (margin 27 K), Q2: 81 + 5 × (1.2 + 0.5) = 89.5 °C (65.5 K).
  const doc = study({ profile: { segments: [{ durationS: 600, powerW: { Q1: 20, Q2: 5 } }], periodic: true } });
  const { setup, options } = rankingSetupFromStudy(doc, 'HS');
  const result = rankSinks(setup, [constant('fits', 0.9, 250), constant('small', 2.2, 50)], options);
  const fits = result.ranked.find((r) => r.id === 'fits')!;

  it('gives each junction the series sum, enclosure rise included', () => {
    assertNear(fits.devices[0].peakC, 103, 1e-6, 'Tj Q1');
    assertNear(fits.devices[1].peakC, 89.5, 1e-6, 'Tj Q2');
    assertNear(fits.steady!.marginK, 27, 1e-9, 'steady margin (Q1)');
    expect(fits.status).toBe('pass');
  });

  it('counts the enclosure rise in the required Rθsa', () => {
    // Q1: (130 − 30 − 24 − 22)/30 = 1.8 K/W; Q2: (155 − 30 − 24 − 8.5)/30 = 3.083 K/W.
    assertNear(result.required.rsaKPerW, 1.8, 1e-12, 'required Rθsa');
    expect(result.required.limitingDevice).toBe('Q1');
    assertNear(result.required.enclosureRiseK!, 24, 1e-12, 'enclosure rise');
    // 2.2 K/W: Tj,Q1 = 30 + 24 + 66 + 22 = 142 °C, 12 K over its target, in steady state and in the run.
    const small = result.ranked.find((r) => r.id === 'small')!;
    assertNear(small.steady!.marginK, -12, 1e-9, 'steady margin of the small sink');
    assertNear(small.devices[0].peakC, 142, 1e-6, 'Tj Q1 on the small sink');
    expect(result.steadyChoice?.id).toBe('fits');
    expect(result.assumptions.join(' ')).toContain('enclosure air');
  });

  it('says when the enclosure’s rise alone leaves no room for any sink', () => {
    // 30 W × 3.5 K/W = 105 K above the ambient, more than the 100 K from 30 °C to Q1's 130 °C target.
    const sealed = rankSinks({ ...setup, enclosure: { rthKPerW: 3.5, capacityJPerK: 400 } }, [constant('fits', 0.9, 250)], options);
    expect(sealed.required.feasible).toBe(false);
    expect(sealed.required.reason).toContain('the enclosure air rises 105 K above the ambient');
    expect(sealed.required.reason).toContain('alone uses up the 100 K');
    expect(sealed.message).toMatch(/^No sink can meet the targets: device "Q1": the enclosure air rises 105 K/);
  });
});

describe('ranking inside an enclosure against the study’s own evaluation', () => {
  // The study pipeline (a separate solver path: its own network, event-driven or batch
  // stretches) solves the same network when the study's sink is the candidate: a constant or
  // forced-air Rθsa needs no re-linearisation, so both are exact and their peaks agree.
  it('gives the same peaks for a constant Rθsa, from cold over three passes', () => {
    const doc = study();
    const { setup, options } = rankingSetupFromStudy(doc, 'HS');
    const ranked = rankSinks(setup, [constant('HS', 0.9, 250)], options).ranked[0];
    const evaluated = evaluateStudy(doc, { seriesPoints: 0 });
    for (const d of ranked.devices) assertNear(d.peakC, evaluated.devices[d.id].peakJunctionC, 1e-4, `peak ${d.id}`);
    // The enclosure air matters here: straight to the ambient Q1 peaks about 1.2 K lower.
    const open = rankSinks({ ...setup, enclosure: undefined }, [constant('HS', 0.9, 250)], options).ranked[0];
    expect(ranked.devices[0].peakC - open.devices[0].peakC).toBeGreaterThan(1);
  });

  it('gives the same peaks for a forced-air sink at the study’s site, the enclosure derated once', () => {
    const curve = [{ airSpeedMPerS: 1, rthKPerW: 1.2 }, { airSpeedMPerS: 4, rthKPerW: 0.6 }];
    const doc = study({ site: { altitudeM: 1500 } }, { rthKPerW: undefined, forcedAir: { airSpeedMPerS: 2, points: curve } });
    const { setup, options } = rankingSetupFromStudy(doc, 'HS');
    expect(options.airSpeedMPerS).toBe(2);
    const ranked = rankSinks(setup, [{ id: 'HS', forcedAir: curve, capacityJPerK: 250 }], options).ranked[0];
    const evaluated = evaluateStudy(doc, { seriesPoints: 0 });
    assertNear(ranked.rsaKPerW!, evaluated.sinks.HS.rthKPerW, 1e-9, 'Rθsa at the site');
    for (const d of ranked.devices) assertNear(d.peakC, evaluated.devices[d.id].peakJunctionC, 1e-4, `peak ${d.id}`);
  });

  it('linearises natural convection at the sink’s rise above the enclosure air, within the 1 % tolerance', () => {
    // A heavy sink (3 kJ/K, τ near an hour) under a 60 s load cycle repeated forever: its rise
    // above the enclosure air barely moves over a period, so the ranking's Rθsa at the mean
    // rise and the study's own re-linearised Rθsa (each to 1 % on Rθsa: CONVECTION_REL_TOL,
    // CONVECTION_TOLERANCE) must agree, and so must the junction peaks, to 2 % of that rise.
    const doc = study(
      {
        enclosure: { rthKPerW: RENC, capacityJPerK: 2000 },
        profile: {
          segments: [
            { durationS: 20, powerW: { Q1: 30, Q2: 5 } },
            { durationS: 40, powerW: { Q1: 5 } },
          ],
          periodic: true,
        },
      },
      { rthKPerW: 1.0, capacityJPerK: 3000, naturalConvection: { referenceRiseK: 40, exponent: 0.25 } },
    );
    const { setup, options } = rankingSetupFromStudy(doc, 'HS');
    const ranked = rankSinks(setup, [{ id: 'HS', natural: { rthKPerW: 1.0, referenceRiseK: 40, exponent: 0.25 }, capacityJPerK: 3000 }], options).ranked[0];
    const evaluated = evaluateStudy(doc, { seriesPoints: 0 });

    // Periodic: the mean heat through Rθsa is the mean power, (40 × 20 + 5 × 40)/60 = 16.67 W,
    // so the mean rise is the law's closed-form fixed point ΔT = (Rref ΔTref^n P)^(1/(1+n))
    // (h ∝ ΔT^(1/4), laminar natural convection: Incropera & DeWitt ch. 9).
    const steady = naturalConvectionSteady(1.0, 40, 1000 / 60, 0.25);
    assertNear(ranked.meanRiseK!, steady.riseK, 1e-6, 'mean rise above the enclosure air');
    assertRelative(ranked.rsaKPerW!, steady.rsaKPerW, 0.01, 'Rθsa at the mean rise');
    // Above the ambient instead (13.3 K more), Rθsa would be about 12 % lower: outside the study's range.
    const [low, high] = evaluated.sinks.HS.rthRangeKPerW!;
    expect(ranked.rsaKPerW!).toBeGreaterThanOrEqual(low * 0.99);
    expect(ranked.rsaKPerW!).toBeLessThanOrEqual(high * 1.01);
    for (const d of ranked.devices) assertNear(d.peakC, evaluated.devices[d.id].peakJunctionC, 0.02 * steady.riseK, `peak ${d.id}`);
  });
});
