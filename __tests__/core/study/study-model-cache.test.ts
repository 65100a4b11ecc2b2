import fs from 'node:fs';
import path from 'node:path';

import { compileNetwork } from '@/core/thermal';
import { parseStudy } from '@/core/study';
import { createStudyModel } from '@/core/study/study-model';
import { buildStudyNetwork, packageStages } from '@/core/study/build-network';

/** The lab-supply demo (demo data): one bipolar pair on a natural-convection sink. */
const raw = () => JSON.parse(fs.readFileSync(path.resolve(__dirname, '../../../examples/lab-supply-two-tap.json'), 'utf8'));

describe('compiled networks kept across evaluations', () => {
  test('a study model holds the same networks compileNetwork gives for its specs, however often it is made', () => {
    const doc = parseStudy(raw());
    const first = createStudyModel(doc, 0.01);
    const again = createStudyModel(doc, 0.01);
    // The uncached compilation is the reference.
    expect(again.reference).toEqual(compileNetwork(first.referenceSpec));
    expect(again.reference).toBe(first.reference);
    // A state 40 K above a 25 °C ambient calls for a Rθsa other than the given one: that network too.
    const T = new Float64Array(first.reference.nodeCount).fill(65);
    const rsa = new Float64Array(doc.sinks.length);
    const model = again.modelAt(T, 25, rsa);
    expect(rsa[0]).not.toBe(doc.sinks[0].rthKPerW);
    const stages = doc.devices.map((d) => packageStages(d.package));
    expect(model).toEqual(compileNetwork(buildStudyNetwork(doc, stages, rsa).spec));
  });

  test('another network is compiled afresh, not taken from the one kept', () => {
    const a = parseStudy(raw());
    const changed = raw();
    changed.sinks[0].rthKPerW = 0.8;
    const b = parseStudy(changed);
    const ma = createStudyModel(a, 0.01);
    const mb = createStudyModel(b, 0.01);
    expect(mb.reference).not.toEqual(ma.reference);
    expect(mb.reference).toEqual(compileNetwork(mb.referenceSpec));
  });
});
