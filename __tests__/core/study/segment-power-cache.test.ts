import fs from 'node:fs';
import path from 'node:path';

import { parseStudy, type ProfileSegment } from '@/core/study';
import { createSegmentPowerCache, fedDevices, segmentPower } from '@/core/study/segment-power';
import { selectRailTaps } from '@/core/study/rail-selection';

/** The lab-supply demo (demo data), its rail segments resolved to electrical ones. */
const raw = JSON.parse(fs.readFileSync(path.resolve(__dirname, '../../../examples/lab-supply-two-tap.json'), 'utf8'));
const doc = selectRailTaps(parseStudy(raw)).doc;

describe('segment power remembered by drive value', () => {
  test('gives what segmentPower gives, for repeated drives, other drives, a powerW entry and a device off', () => {
    const base = doc.profile.segments.filter((s) => s.electrical);
    expect(base.length).toBeGreaterThan(2);
    // The same drives again as new segment objects, then one with a powerW entry (not cached by drive).
    const again: ProfileSegment[] = base.map((s) => ({ ...s, electrical: { ...s.electrical! } }));
    const withPower: ProfileSegment = { ...base[0], powerW: { [doc.devices[0].id]: 3 } };
    const powerFor = createSegmentPowerCache(doc);
    const allOn = doc.devices.map(() => true);
    const off = doc.devices.map(() => false);
    for (const s of [...base, ...again, withPower]) {
      const fed = fedDevices(doc, s);
      // The uncached computation is the reference.
      expect(powerFor(s, fed, allOn)).toEqual(segmentPower(doc, s, fed, allOn));
      expect(powerFor(s, fed, off)).toEqual(segmentPower(doc, s, fed, off));
    }
    // A repeated drive is served from the cache: the same object.
    expect(powerFor(again[1], fedDevices(doc, again[1]), allOn)).toBe(powerFor(base[1], fedDevices(doc, base[1]), allOn));
  });
});
