import { evaluateStudy, parseStudy } from '@/core/study';
import { studyVerdict } from '@/features/results/verdict';
import { verdictSummary } from '@/features/results/verdict-summary';

import labSupply from '../../examples/lab-supply-two-tap.json';

// A study passes only when the junctions stay below their targets AND every operating point
// lies inside the derated safe operating area: an SOA violation fails the part however cool
// it runs (second breakdown is a failure mode of its own; common practice, PHYSICS.md §4).
describe('studyVerdict', () => {
  const solve = (doc: unknown) => evaluateStudy(parseStudy(doc));

  it('passes the demo lab supply, whose junctions and SOA points are both inside their limits', () => {
    const result = solve(labSupply);
    expect(result.meetsTarget).toBe(true);
    expect(result.soaPasses).toBe(true);
    const verdict = studyVerdict(result);
    expect(verdict.passes).toBe(true);
    expect(verdict.headline.startsWith('Passes:')).toBe(true);
  });

  it('fails a study that stays cool but runs outside its SOA, and says where', () => {
    // The same supply with a part rated for 0.5 A continuous: the thermal answer is unchanged.
    const weak = structuredClone(labSupply) as typeof labSupply;
    weak.devices[0].soa.icMaxA = 0.5;
    weak.devices[0].soa.icPulseMaxA = 0.8;
    const result = solve(weak);
    expect(result.meetsTarget).toBe(true);
    expect(result.soaPasses).toBe(false);
    const verdict = studyVerdict(result);
    expect(verdict.passes).toBe(false);
    expect(verdict.headline).toMatch(/^Fails: Q1 is outside its derated SOA at /);
    expect(verdict.headline).toMatch(/% of the allowed current/);
  });

  it('sends the same answer in the verdict line a worker hands over ahead of the full result', () => {
    const weak = structuredClone(labSupply) as typeof labSupply;
    weak.devices[0].soa.icMaxA = 0.5;
    weak.devices[0].soa.icPulseMaxA = 0.8;
    const result = solve(weak);
    const summary = verdictSummary(result);
    expect(summary.verdict.passes).toBe(false);
    expect(summary.verdict.headline).toBe(studyVerdict(result).headline);
    // The SOA check's line closes the notes, as in the full results.
    expect(summary.verdict.notes[summary.verdict.notes.length - 1]).toMatch(/^SOA check fails for Q1/);
    expect(summary.warnings).toEqual(result.warnings);
    expect(summary.ownWarnings.every((w) => result.warnings.includes(w))).toBe(true);
    // Far smaller than the result it summarises, so it is cheap to send (structured clone of plain data).
    expect(JSON.stringify(summary).length).toBeLessThan(JSON.stringify(result).length / 10);
  });
});
