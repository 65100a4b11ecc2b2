import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '@/cli/solve';

const root = join(__dirname, '../..');
const example = join(root, 'examples/bench-electronic-load.json');
const work = mkdtempSync(join(tmpdir(), 'solve-'));

function run(args: string[]) {
  let stdout = '';
  let stderr = '';
  const code = main(args, { stdout: (t) => (stdout += t), stderr: (t) => (stderr += t) });
  return { code, stdout, stderr };
}

describe('solve command line', () => {
  it('prints the result JSON with each device peak junction temperature and its time', () => {
    const { code, stdout, stderr } = run([example]);
    expect(code).toBe(0);
    expect(stderr).toBe('');
    const result = JSON.parse(stdout);
    for (const id of ['Q1', 'Q2']) {
      expect(typeof result.devices[id].peakJunctionC).toBe('number');
      expect(typeof result.devices[id].peakTimeS).toBe('number');
    }
    expect(result.series).toBeUndefined();
  });

  it('prints the SOA checks and the rail-plan summary; the map grid and SOA boundaries only with --series', () => {
    const lab = join(root, 'examples/lab-supply-two-tap.json');
    const brief = JSON.parse(run([lab]).stdout);
    expect(brief.soaPasses).toBe(true);
    expect(brief.soa.Q1.worst.vceV).toBeGreaterThan(0);
    expect(brief.soa.Q1.boundaries).toBeUndefined();
    expect(brief.railPlan.worst.overall.powerW).toBeGreaterThan(0);
    expect(brief.railPlan.map).toBeUndefined();
    expect(brief.events.some((e: { kind: string }) => e.kind === 'tap-change')).toBe(true);
    const full = JSON.parse(run([lab, '--series']).stdout);
    // Cells a tap cannot serve print as null (JSON has no NaN).
    expect(full.railPlan.map.overall.powerW.flat().every((p: unknown) => p === null || typeof p === 'number')).toBe(true);
    expect(full.soa.Q1.boundaries.atReference.condition.caseC).toBe(25);
  });

  it('writes a CSV with time_s, one column per node, exact boundary rows and the peak rows', () => {
    const csv = join(work, 'out.csv');
    const { code, stdout } = run([example, '--csv', csv]);
    expect(code).toBe(0);
    const result = JSON.parse(stdout);
    const [header, ...rows] = readFileSync(csv, 'utf8').trim().split('\n');
    const columns = header.split(',');
    expect(columns).toEqual(['time_s', 'Q1.junction_c', 'Q1.case_c', 'Q2.junction_c', 'Q2.case_c', 'HS1.sink_c', 'ambient_c', 'peak_of']);
    const table = rows.map((r) => r.split(','));
    const times = table.map((r) => Number(r[0]));
    // Every segment boundary of the 60 s period (10, 20, 10, 20 s segments) is a row.
    for (const t of [0, 10, 30, 40, 60]) expect(times).toContain(t);
    for (let i = 1; i < times.length; i++) expect(times[i]).toBeGreaterThanOrEqual(times[i - 1]);
    // The peak row holds the JSON's peak, exactly.
    const j1 = columns.indexOf('Q1.junction_c');
    const peakRow = table.find((r) => r[columns.length - 1].split(' ').includes('Q1.junction'))!;
    expect(Number(peakRow[0])).toBe(result.devices.Q1.peakTimeS);
    expect(Number(peakRow[j1])).toBe(result.devices.Q1.peakJunctionC);
    expect(Math.max(...table.map((r) => Number(r[j1])))).toBeCloseTo(result.devices.Q1.peakJunctionC, 9);
  });

  it.each([
    ['an unreadable file', () => join(work, 'missing.json'), /missing\.json: cannot read the file \(ENOENT\)/],
    ['bad JSON', () => write('bad.json', '{ "format": '), /bad\.json: not valid JSON/],
    ['an invalid field', () => write('neg.json', JSON.stringify(withNegativeTau())), /neg\.json: devices\[0\]\.package\.terms\[1\]\.tauS: must be greater than zero/],
  ])('exits 2 with one line on stderr for %s', (_name, file, message) => {
    const { code, stdout, stderr } = run([file()]);
    expect(code).toBe(2);
    expect(stdout).toBe('');
    expect(stderr).toMatch(message);
    expect(stderr.trim().split('\n')).toHaveLength(1);
  });

  it('exits 2 from a real process on a bad file', () => {
    const file = write('neg2.json', JSON.stringify(withNegativeTau()));
    const child = spawnSync('npx', ['tsx', 'src/cli/solve.ts', file], { cwd: root, encoding: 'utf8' });
    expect(child.status).toBe(2);
    expect(child.stderr.trim()).toBe(`${file}: devices[0].package.terms[1].tauS: must be greater than zero, got -0.0016 s`);
  });
});

function write(name: string, text: string): string {
  const file = join(work, name);
  writeFileSync(file, text);
  return file;
}

function withNegativeTau() {
  const json = JSON.parse(readFileSync(example, 'utf8'));
  json.devices[0].package.terms[1].tauS = -0.0016;
  return json;
}
