import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { evaluateStudy, parseStudy } from '@/core/study';
import { contractStudy } from './study-fixtures';

const text = readFileSync(join(__dirname, '../../../docs/study-format.md'), 'utf8');

/** The first indented block after `marker`, as the members of one JSON object. */
function snippet(marker: string): Record<string, any> {
  const lines = text.slice(text.indexOf(marker)).split('\n');
  const first = lines.findIndex((line) => line.startsWith('    '));
  const end = lines.findIndex((line, i) => i > first && !line.startsWith('    '));
  return JSON.parse(`{${lines.slice(first, end).join('\n')}}`);
}

describe('docs/study-format.md', () => {
  it('has a full example that parses and solves', () => {
    const section = text.slice(text.indexOf('## Full example'));
    const block = section.split('\n').filter((line) => line.startsWith('    ')).map((line) => line.slice(4));
    const start = block.findIndex((line) => line === '{');
    const end = block.findIndex((line, i) => i > start && line === '}');
    const doc = parseStudy(JSON.parse(block.slice(start, end + 1).join('\n')));
    expect(doc.devices[0].electrical?.thermalShutdown).toEqual({ tripC: 165, hysteresisK: 15 });
    expect(doc.profile.segments).toHaveLength(22);
    expect(Number.isFinite(evaluateStudy(doc).devices.Q1.peakJunctionC)).toBe(true);
  });

  it('has SOA, divider and rail-plan examples that parse and solve in a study', () => {
    const study = contractStudy();
    Object.assign(study.devices[0], snippet('### `soa`'), snippet('**Adjustable divider.**'));
    Object.assign(study, snippet('## `railPlan`'));
    const doc = parseStudy(study);
    expect(doc.devices[0].soa?.transistor).toBe('mosfet');
    expect(doc.railPlan?.taps).toHaveLength(2);
    const r = evaluateStudy(doc, { seriesPoints: 0 });
    expect(r.soa.Q1.worst).not.toBeNull();
    expect(r.railPlan!.worst.overall!.powerW).toBeGreaterThan(0);
  });
});
