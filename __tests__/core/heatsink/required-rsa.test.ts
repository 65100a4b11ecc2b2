import { requiredRsa } from '@/core/heatsink';
import { assertNear } from './assert-near';

describe('requiredRsa', () => {
  it('gives (Tj,target − Ta)/P − Rjc − Rcs for one device', () => {
    // PHYSICS.md §5: target 130 °C, ambient 40 °C, 15 W, Rjc 1.5, Rcs 0.5:
    // 90/15 − 1.5 − 0.5 = 6 − 2 = 4 K/W.
    const r = requiredRsa([{ id: 'u1', powerW: 15, rjcKPerW: 1.5, rcsKPerW: 0.5, tjTargetC: 130 }], 40);
    assertNear(r.rsaKPerW, 4, 1e-12, 'Rsa');
    expect(r.feasible).toBe(true);
    expect(r.limitingDevice).toBe('u1');
  });

  it('takes min_k (Tj,target − Ta − Pk (Rjc,k + Rcs,k)) / Ptotal for several devices', () => {
    // PHYSICS.md §5, ambient 50 °C:
    //   a: 20 W, Rjc 0.8 + Rcs 0.2 = 1.0 → headroom 125 − 50 − 20 = 55 K
    //   b: 2 parts × 10 W, Rjc 2.0 + Rcs 0.5 → headroom 155 − 50 − 25 = 80 K
    //   Ptotal = 20 + 2 × 10 = 40 W → min(55, 80)/40 = 1.375 K/W, set by a.
    const r = requiredRsa(
      [
        { id: 'a', powerW: 20, rjcKPerW: 0.8, rcsKPerW: 0.2, tjTargetC: 125 },
        { id: 'b', powerW: 10, rjcKPerW: 2, rcsKPerW: 0.5, tjTargetC: 155, count: 2 },
      ],
      50,
    );
    assertNear(r.totalPowerW, 40, 1e-12, 'Ptotal');
    assertNear(r.rsaKPerW, 1.375, 1e-12, 'Rsa');
    assertNear(r.headroomK.b, 80, 1e-12, 'headroom b');
    expect(r.limitingDevice).toBe('a');
  });

  it('says why no sink can do it when the junction-to-sink path alone uses up the rise', () => {
    // 40 W × (1.5 + 0.5) K/W = 80 K > 125 − 60 = 65 K: required value (65 − 80)/40 < 0.
    const r = requiredRsa([{ id: 'q1', powerW: 40, rjcKPerW: 1.5, rcsKPerW: 0.5, tjTargetC: 125 }], 60);
    expect(r.feasible).toBe(false);
    assertNear(r.rsaKPerW, -15 / 40, 1e-12, 'Rsa');
    expect(r.reason).toContain('device "q1"');
    expect(r.reason).toContain('even an ideal sink fails');
  });

  it('says so when the target is not above the ambient', () => {
    const r = requiredRsa([{ id: 'q1', powerW: 5, rjcKPerW: 1, rcsKPerW: 0, tjTargetC: 40 }], 45);
    expect(r.feasible).toBe(false);
    expect(r.reason).toContain('not above the ambient');
  });

  it('needs no sink at all without power', () => {
    const r = requiredRsa([{ id: 'q1', powerW: 0, rjcKPerW: 1, rcsKPerW: 0, tjTargetC: 100 }], 25);
    expect(r.rsaKPerW).toBe(Infinity);
    expect(r.feasible).toBe(true);
  });

  it('counts the enclosure air’s steady rise, P_total · Rθ(enclosure), in every headroom', () => {
    // Thermal resistances in series (common practice): the whole 40 W crosses the enclosure
    // wall, 40 × 0.5 = 20 K. With the devices of the case above, ambient 50 °C:
    //   a: 125 − 50 − 20 − 20 = 35 K, b: 155 − 50 − 25 − 20 = 60 K → 35/40 = 0.875 K/W.
    const r = requiredRsa(
      [
        { id: 'a', powerW: 20, rjcKPerW: 0.8, rcsKPerW: 0.2, tjTargetC: 125 },
        { id: 'b', powerW: 10, rjcKPerW: 2, rcsKPerW: 0.5, tjTargetC: 155, count: 2 },
      ],
      50,
      0.5,
    );
    assertNear(r.enclosureRiseK!, 20, 1e-12, 'enclosure rise');
    assertNear(r.headroomK.a, 35, 1e-12, 'headroom a');
    assertNear(r.headroomK.b, 60, 1e-12, 'headroom b');
    assertNear(r.rsaKPerW, 0.875, 1e-12, 'Rsa');
    expect(r.feasible).toBe(true);
  });

  it('says when the enclosure’s rise alone, or with the junction-to-sink path, leaves nothing for a sink', () => {
    // 15 W × 7 K/W = 105 K > 130 − 40 = 90 K: the air alone is too hot.
    const alone = requiredRsa([{ id: 'u1', powerW: 15, rjcKPerW: 1.5, rcsKPerW: 0.5, tjTargetC: 130 }], 40, 7);
    expect(alone.feasible).toBe(false);
    expect(alone.reason).toBe(
      'device "u1": the enclosure air rises 105 K above the ambient (P_total·Rθ(enclosure) = 15 W × 7 K/W) in steady state, ' +
        'which alone uses up the 90 K from ambient to target, so no sink can help: lower the power or the enclosure\'s Rθ ' +
        '(vents, a larger housing), lower the ambient, or raise the target',
    );
    // 15 W × 4 K/W = 60 K, plus 15 W × 2 K/W = 30 K: together 90 K, all of it.
    const both = requiredRsa([{ id: 'u1', powerW: 15, rjcKPerW: 1.5, rcsKPerW: 0.5, tjTargetC: 130 }], 40, 4);
    expect(both.feasible).toBe(false);
    assertNear(both.rsaKPerW, 0, 1e-12, 'Rsa');
    expect(both.reason).toContain('junction to sink rises 30 K');
    expect(both.reason).toContain('the enclosure air rises 60 K above the ambient');
    expect(both.reason).toContain('together 90 K, at least the 90 K from ambient to target');
  });

  it('names the field of bad input', () => {
    expect(() => requiredRsa([{ id: 'q1', powerW: 1, rjcKPerW: 1, rcsKPerW: 0, tjTargetC: 100 }], 25, -1)).toThrow('enclosureRthKPerW: must be ≥ 0, got -1');
    expect(() => requiredRsa([{ id: 'q1', powerW: -1, rjcKPerW: 1, rcsKPerW: 0, tjTargetC: 100 }], 25)).toThrow('devices[0].powerW: must be ≥ 0');
    expect(() => requiredRsa([], 25)).toThrow('devices: needs at least 1 entry');
  });
});
