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

  it('names the field of bad input', () => {
    expect(() => requiredRsa([{ id: 'q1', powerW: -1, rjcKPerW: 1, rcsKPerW: 0, tjTargetC: 100 }], 25)).toThrow('devices[0].powerW: must be ≥ 0');
    expect(() => requiredRsa([], 25)).toThrow('devices: needs at least 1 entry');
  });
});
