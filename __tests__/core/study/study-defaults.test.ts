import { checkDefaults, defaultSections, EMPTY_STUDY_DEFAULTS, parseStudy, type StudyDefaults } from '@/core/study';
import { LESIT_MODEL } from '@/core/reliability';
import { twoDeviceStudy } from './study-fixtures';

const withDefaults = (d: Partial<StudyDefaults>) => {
  const settings = { ...EMPTY_STUDY_DEFAULTS, ...d };
  return { settings, study: { ...twoDeviceStudy(), ...defaultSections(settings).document } };
};

/** A small seeded generator (Park–Miller minimal standard, CACM 1988), so a failure repeats. */
function lcg(seed: number) {
  let s = seed;
  return () => (s = (s * 48271) % 2147483647) / 2147483647;
}

describe('team defaults for new studies', () => {
  it('writes only the values set, as explicit study fields; the parser fills the rest with the built-in law', () => {
    const { study } = withDefaults({ marginK: 25, lifetimeInNewStudies: true, missionHoursPerDay: 8, cyclingExponent: 4.5, cyclingExponentSource: 'maker report' });
    const doc = parseStudy(study);
    expect(doc.marginK).toBe(25);
    // Unset A and Ea stay the LESIT fit's (Held et al. 1997, from memory: A = 640, Q = 78 kJ/mol).
    expect(doc.lifetime?.powerCycling).toEqual({ coefficient: 640, exponent: 4.5, activationEnergyEV: LESIT_MODEL.activationEnergyEV });
    expect(LESIT_MODEL.activationEnergyEV).toBeCloseTo(78000 / 96485.33, 6);
    expect(doc.site).toBeUndefined();
    expect(doc.touch).toBeUndefined();
  });

  it('leaves the lifetime section out of new studies unless asked for, but still checks its values', () => {
    const { study } = withDefaults({ missionHoursPerDay: 8, cyclingExponent: 4.5, cyclingExponentSource: 'maker report' });
    expect('lifetime' in study).toBe(false);
    expect(checkDefaults({ ...EMPTY_STUDY_DEFAULTS, cyclingExponent: 30, cyclingExponentSource: 'maker report' })).toEqual({ field: 'cyclingExponent', message: 'must be at most 20, got 30' });
  });

  it('a touch rule by material and contact gives the table limit (IEC 62368-1 TS1, from memory: glass, up to 1 min, 56 °C)', () => {
    const { study } = withDefaults({ touchMaterial: 'glass', touchContact: 'short' });
    const doc = parseStudy(study);
    expect(Object.values(doc.touch!.sinks)[0]).toMatchObject({ limitC: 56, material: 'glass', contact: 'short' });
  });

  it('accepts exactly the settings whose new study the study parser accepts', () => {
    const random = lcg(20250304);
    const pick = <T>(options: T[]) => options[Math.floor(random() * options.length)];
    let accepted = 0;
    for (let i = 0; i < 400; i++) {
      const d: Partial<StudyDefaults> = {
        marginK: pick([null, -1, 0, 25]),
        siteAltitudeM: pick([null, -700, 0, 2000, 12000]),
        siteRadiationShare: pick([null, 0.2, 0.95]),
        lifetimeInNewStudies: true,
        missionHoursPerDay: pick([null, 8, 30]),
        cyclingExponent: pick([null, 0, 5, 25]),
        cyclingExponentSource: 'test',
        arrheniusReferenceC: pick([null, 55, -300]),
        arrheniusActivationEV: pick([null, 0.7, 9]),
        arrheniusActivationSource: 'test',
        touchMaterial: pick([null, 'metal']),
        touchLimitC: pick([null, 50]),
      };
      const { settings, study } = withDefaults(d);
      const problem = checkDefaults(settings);
      let parsed = true;
      try {
        parseStudy(study);
      } catch {
        parsed = false;
      }
      expect({ settings: d, accepted: problem === null }).toEqual({ settings: d, accepted: parsed });
      if (parsed) accepted++;
    }
    // Both outcomes are exercised.
    expect(accepted).toBeGreaterThan(0);
    expect(accepted).toBeLessThan(400);
  });
});
