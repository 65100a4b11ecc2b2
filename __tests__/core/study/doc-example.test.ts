import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { evaluateStudy, parseStudy } from '@/core/study';

describe('docs/study-format.md', () => {
  it('has a full example that parses and solves', () => {
    const text = readFileSync(join(__dirname, '../../../docs/study-format.md'), 'utf8');
    const section = text.slice(text.indexOf('## Full example'));
    const block = section.split('\n').filter((line) => line.startsWith('    ')).map((line) => line.slice(4));
    const start = block.findIndex((line) => line === '{');
    const end = block.findIndex((line, i) => i > start && line === '}');
    const doc = parseStudy(JSON.parse(block.slice(start, end + 1).join('\n')));
    expect(doc.devices[0].electrical?.thermalShutdown).toEqual({ tripC: 165, hysteresisK: 15 });
    expect(doc.profile.segments).toHaveLength(22);
    expect(Number.isFinite(evaluateStudy(doc).devices.Q1.peakJunctionC)).toBe(true);
  });
});
