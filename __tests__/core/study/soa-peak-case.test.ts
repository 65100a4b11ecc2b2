import fs from 'node:fs';
import path from 'node:path';

import { evaluateStudy, parseStudy, type StudyResult } from '@/core/study';
import { checkOperatingPoints } from '@/core/soa';

const labSupply = () => JSON.parse(fs.readFileSync(path.join(__dirname, '../../../examples/lab-supply-two-tap.json'), 'utf8')) as Record<string, any>;

const worstMargin = (r: StudyResult, id: string) => r.soa[id].worst?.margin ?? Infinity;

// Reference: the SOA check at each stretch's own highest case temperature (the default), and
// derating (PHYSICS.md §4): the allowed current falls as the case warms, so a check at the
// device's peak case temperature errs on the safe side and passes only where the other passes.
describe("SOA points checked at the device's peak case temperature", () => {
  it('passes where the stretch check passes, with the same thermal results and lower margins at the peak case temperature', () => {
    const doc = parseStudy(labSupply());
    const exact = evaluateStudy(doc);
    const atPeak = evaluateStudy(doc, { soaCaseTemperature: 'peak' });
    const ids = Object.keys(exact.soa);
    expect(ids.length).toBeGreaterThan(0);
    for (const id of ids) expect(exact.soa[id].passed).toBe(true);
    for (const id of ids) {
      expect(atPeak.soa[id].passed).toBe(true);
      const peakCase = atPeak.devices[id].peakCaseC;
      for (const p of atPeak.soa[id].points) expect(p.caseC).toBe(peakCase);
      expect(worstMargin(atPeak, id)).toBeLessThanOrEqual(worstMargin(exact, id) + 1e-12);
      expect(atPeak.soa[id].stretches).toBe(exact.soa[id].stretches);
    }
    expect(atPeak.devices).toEqual(exact.devices);
    expect(atPeak.meetsTarget).toBe(exact.meetsTarget);
    expect(atPeak.worst).toEqual(exact.worst);
  });

  it('gives the stretch check’s result when a point passes at its own case temperature but not at the peak one', () => {
    // A hard step while the case is cool, then a long load that heats it: the first point's
    // margin is above 1 at its own case temperature and below 1 at the later peak.
    const raw = labSupply();
    raw.profile = { segments: [{ durationS: 2, voutV: 3, iloadA: 2.5 }, { durationS: 900, voutV: 12, iloadA: 3 }, { durationS: 2, voutV: 14, iloadA: 0.5 }] };
    for (const d of raw.devices) if (d.soa?.secondBreakdown) d.soa.secondBreakdown.referenceIcA = 0.4;
    const doc = parseStudy(raw);
    const exact = evaluateStudy(doc);
    const [id] = Object.keys(exact.soa);
    expect(exact.soa[id].passed).toBe(true);
    const device = doc.devices.find((d) => d.id === id)!;
    const hot = checkOperatingPoints(device.soa!, exact.soa[id].points.map((p) => ({ ...p, caseC: exact.devices[id].peakCaseC })));
    expect(hot.passed).toBe(false);
    expect(evaluateStudy(doc, { soaCaseTemperature: 'peak' })).toEqual(exact);
  });

  it('gives the stretch check’s own result when a point fails at the peak case temperature', () => {
    // A second-breakdown line low enough that the hottest case makes some point fail.
    const raw = labSupply();
    for (const d of raw.devices) if (d.soa?.secondBreakdown) d.soa.secondBreakdown.referenceIcA = 0.6;
    const doc = parseStudy(raw);
    const exact = evaluateStudy(doc);
    const atPeak = evaluateStudy(doc, { soaCaseTemperature: 'peak' });
    expect(Object.values(exact.soa).some((r) => !r.passed)).toBe(true);
    expect(atPeak).toEqual(exact);
  });
});
