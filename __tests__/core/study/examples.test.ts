import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { evaluateStudy, parseStudy } from '@/core/study';

const dir = join(__dirname, '../../../examples');
const files = readdirSync(dir).filter((f) => f.endsWith('.json'));

/** Every number in a value, with its path. */
function numbers(value: unknown, path = 'result', out: [string, number][] = []): [string, number][] {
  if (typeof value === 'number') out.push([path, value]);
  else if (Array.isArray(value)) value.forEach((v, i) => numbers(v, `${path}[${i}]`, out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) numbers(v, `${path}.${k}`, out);
  return out;
}

describe('demo studies in examples/', () => {
  it('holds the three studies of the product description', () => {
    expect(files.sort()).toEqual(['bench-electronic-load.json', 'lab-supply-two-tap.json', 'onboard-24v-to-5v.json']);
  });

  it.each(files)('%s parses, is labelled demo data and solves without NaN', (file) => {
    const json = JSON.parse(readFileSync(join(dir, file), 'utf8'));
    const doc = parseStudy(json);
    // The server seeds its studies from these two fields.
    expect(json.title).toMatch(/demo data/i);
    expect(json.description).toMatch(/demo data/i);
    const result = evaluateStudy(doc);
    const bad = numbers({ ...result, table: undefined }).filter(([, v]) => !Number.isFinite(v));
    expect(bad).toEqual([]);
    for (const d of Object.values(result.devices)) {
      // A junction can never be cooler than the coolest ambient nor beyond the hottest node a segment could drive it to.
      expect(d.peakJunctionC).toBeGreaterThanOrEqual(result.ambient.minC);
      expect(d.peakTimeS).toBeGreaterThanOrEqual(0);
      expect(d.peakTimeS).toBeLessThanOrEqual(result.durationS);
    }
  });
});
