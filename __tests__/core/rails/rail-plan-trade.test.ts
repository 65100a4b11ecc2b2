import {
  adjustableOutputV,
  adjustableTopOfRange,
  bestThresholds,
  checkChatter,
  compileRailPlan,
  railPlanReport,
  tapVoltage,
  tapWorstCases,
} from '@/core/rails';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { regulator, tradePlan, tradeRange } from './trade-scenario';

const model = compileRailPlan(tradePlan);

describe('worst cases of the three-source plan', () => {
  const worst = tapWorstCases(model, regulator, tradeRange);

  it('dissipates ≈ 38 W in two-in-series at the 9.5 V threshold and 2.5 A', () => {
    // Common practice: (24.68 − 9.5) × 2.5 ≈ 38 W (the lowest output also takes off h/2 = 0.05 V).
    const w = worst.taps[1]!;
    assertInDelta(w.powerW, 38, 0.5, 'tap 2 worst case');
    assertInDelta(w.voutV, 9.45, 1e-12, 'lowest output of tap 2');
    assertInDelta(w.currentA, 2.5, 1e-12, 'at full current');
    expect(w.setBy).toBe('capability');
  });

  it('dissipates ≈ 41 W in three-in-series at the 20.5 V threshold and 2.5 A', () => {
    // Common practice: (37 − 20.5) × 2.5 ≈ 41 W.
    assertInDelta(worst.taps[2]!.powerW, 41, 0.5, 'tap 3 worst case');
    expect(worst.overall!.powerW).toBeGreaterThanOrEqual(worst.taps[2]!.powerW);
  });

  it('finds both thresholds safe, the first one near its best value of ≈ 9.5 V', () => {
    // PHYSICS.md §2: θk ≤ Vtap,k(Ik,max) − Vdropout − h/2; common practice puts the first near 9.5 V.
    const [first, second] = bestThresholds(model, regulator, tradeRange);
    assertInDelta(first.bestV, 9.5, 0.1, 'best first threshold');
    expect(first.safe).toBe(true);
    // Two in series at 2.5 A: 24.68 − 2 − 0.05 = 22.63 V, above the 20.5 V in use.
    assertInDelta(second.bestV, 22.63, 0.01, 'best second threshold');
    expect(second.safe).toBe(true);
  });

  it('lowers the worst case of the next tap when the threshold moves up to its best value', () => {
    const report = railPlanReport(model, regulator, tradeRange);
    // (37.02 − 22.58) × 2.5 ≈ 36.1 W instead of ≈ 41 W.
    assertInDelta(report.worstWithBest.taps[2]!.powerW, 36.1, 0.1, 'tap 3 with the best threshold');
    expect(report.worstWithBest.taps[2]!.powerW).toBeLessThan(report.worst.taps[2]!.powerW);
  });

  it('flags an unsafe threshold, and the map shows the dropout it causes', () => {
    const risky = compileRailPlan({ ...tradePlan, thresholdsV: [10.5, 20.5] });
    const report = railPlanReport(risky, regulator, tradeRange, { steps: { vout: 169, iout: 11 } });
    expect(report.thresholds[0].safe).toBe(false);
    expect(report.warnings.some((w) => /Threshold 1 \(10.5 V\)/.test(w))).toBe(true);
    expect(report.warnings.some((w) => /dropout/.test(w))).toBe(true);
  });
});

describe('dissipation map of the three-source plan', () => {
  const report = railPlanReport(model, regulator, tradeRange, { steps: { vout: 135, iout: 11 } });
  const { map } = report;
  const ni = map.ioutA.length;

  it('holds P = (Vtap(I) − Vout)·I + Vtap·Iq in every cell it serves (PHYSICS.md §1)', () => {
    const iq = 0.005;
    const withIq = railPlanReport(model, { ...regulator, iqA: iq }, tradeRange, { steps: { vout: 35, iout: 6 } });
    const m = withIq.map;
    let checked = 0;
    m.taps.forEach((layer, k) => {
      for (let v = 0; v < m.voutV.length; v++) {
        for (let i = 0; i < m.ioutA.length; i++) {
          const c = v * m.ioutA.length + i;
          if (layer.status[c] !== 0) continue;
          const vin = tapVoltage(model, k, m.ioutA[i]);
          assertInDelta(layer.powerW[c], (vin - m.voutV[v]) * m.ioutA[i] + vin * iq, 1e-9, `cell ${c} of tap ${k}`);
          checked++;
        }
      }
    });
    expect(checked).toBeGreaterThan(50);
  });

  it('marks the cells series taps cannot supply instead of hiding them', () => {
    // Above 2.5 A the series taps are over their rating (common practice: series supply the smallest rating).
    const v = map.voutV.findIndex((x) => x > 25);
    const top = v * ni + (ni - 1);
    expect(map.taps[2].status[top]).toBe(3);
    expect(Number.isNaN(map.taps[2].powerW[top])).toBe(true);
    expect(map.overall.status[top]).toBe(3);
  });

  it('peaks no higher than the worst case, and the saw-tooth drops at each tap change', () => {
    let max = -Infinity;
    for (const p of map.overall.powerW) if (p > max) max = p;
    expect(max).toBeLessThanOrEqual(report.worst.overall!.powerW + 1e-9);
    const i25 = map.ioutA.findIndex((x) => Math.abs(x - 2.5) < 1e-12);
    // PHYSICS.md §2 saw-tooth: along Vout at 2.5 A the power falls within a tap and jumps at the change.
    const row = Array.from(map.voutV, (_, v) => ({ p: map.overall.powerW[v * ni + i25], tap: map.overall.tapIndex[v * ni + i25] }));
    const change = row.findIndex((c, v) => v > 0 && c.tap !== row[v - 1].tap);
    expect(row[change - 1].tap).toBe(0);
    expect(row[change].p).toBeGreaterThan(row[change - 1].p + 20);
    expect(row[change - 2].p).toBeGreaterThan(row[change - 1].p);
  });
});

describe('tap-change chatter (PHYSICS.md §2)', () => {
  // Demo relay: 2 ms break, 4700 µF input capacitor; hysteresis 0.1 V → chatter above 0.1·4.7e-3/2e-3 = 0.235 A.
  const relay = { inputCapacitanceF: 4.7e-3, breakTimeS: 2e-3 };

  it('chatters under heavy load with the output sensed (common practice)', () => {
    const c = checkChatter(tradePlan, relay, 2.5);
    assertInDelta(c.droopV, (2.5 * 2e-3) / 4.7e-3, 1e-12, 'ΔV = I·tbreak/Cin');
    assertInDelta(c.chatterAboveA, 0.235, 1e-12, 'current above which it chatters');
    expect(c.chatters).toBe(true);
    expect(c.message).toMatch(/set point/);
  });

  it('does not chatter with a light load, or when the set point is sensed (common practice)', () => {
    expect(checkChatter(tradePlan, relay, 0.1).chatters).toBe(false);
    expect(checkChatter({ ...tradePlan, sensed: 'set-point' }, relay, 2.5).chatters).toBe(false);
  });

  it('appears among the report warnings', () => {
    const r = railPlanReport(model, regulator, tradeRange, { relay, steps: { vout: 5, iout: 3 } });
    expect(r.chatter?.chatters).toBe(true);
    expect(r.warnings.some((w) => /chatter/.test(w))).toBe(true);
  });
});

describe('adjustable regulator output (PHYSICS.md §1)', () => {
  const divider = { r1Ohm: 330, r2Ohm: 10_000 };

  it('reaches 1.25 (1 + 10000/330) ≈ 39 V by its divider', () => {
    // Common practice: R1 = 330 Ω, R2 = 10 kΩ give ≈ 39 V.
    assertInDelta(adjustableOutputV(divider), 39, 0.5, 'divider output');
    // Textbook: + Iadj R2, 50 µA × 10 kΩ = 0.5 V.
    assertInDelta(adjustableOutputV({ ...divider, iadjA: 50e-6 }) - adjustableOutputV(divider), 0.5, 1e-12, 'Iadj R2');
  });

  it('tops out at ≈ 35 V from a 37 V input: the dropout sets the top, not the divider', () => {
    // Common practice: about 35 V in practice from 37 V with about 2 V dropout.
    const top = adjustableTopOfRange(divider, 37, 2);
    expect(top.limitedBy).toBe('dropout');
    assertInDelta(top.reachableV, 35, 1e-12, 'top of range');
    expect(adjustableTopOfRange(divider, 45, 2).limitedBy).toBe('divider');
    expect(() => adjustableOutputV({ r1Ohm: 0, r2Ohm: 1 })).toThrow(/divider\.r1Ohm/);
  });
});

describe('required Rθsa for the worst case (PHYSICS.md §5)', () => {
  it('sizes the sink of one device from the overall worst case', () => {
    const sink = { ambientC: 40, tjTargetC: 125, rthJcKPerW: 1.5, rthCsKPerW: 0.3 };
    const r = railPlanReport(model, regulator, tradeRange, { sink, steps: { vout: 5, iout: 3 } });
    const p = r.worst.overall!.powerW;
    // Rsa = (Tj,target − Ta)/P − Rjc − Rcs.
    assertInDelta(r.requiredRsa!.givenKPerW, 85 / p - 1.8, 1e-12, 'required Rθsa');
    const custom = railPlanReport(model, regulator, tradeRange, { sink: (w) => 100 / w, steps: { vout: 5, iout: 3 } });
    assertInDelta(custom.requiredRsa!.givenKPerW, 100 / p, 1e-12, 'from an input function');
  });
});
