import { describeChanges, diffDocuments } from '../../../src/core/diff';

describe('diffDocuments', () => {
  it('names changed, added and removed fields by path and ignores equal ones', () => {
    const before = { title: 'A', ambient: { temperatureC: 40 }, devices: [{ id: 'Q1', tjMaxC: 150 }], old: 1 };
    const after = { title: 'A', ambient: { temperatureC: 45 }, devices: [{ id: 'Q1', tjMaxC: 175 }, { id: 'Q2' }], new: true };
    expect(diffDocuments(before, after)).toEqual([
      { kind: 'changed', path: 'ambient.temperatureC', before: 40, after: 45 },
      { kind: 'changed', path: 'devices[0].tjMaxC', before: 150, after: 175 },
      { kind: 'added', path: 'devices[1]', after: { id: 'Q2' } },
      { kind: 'added', path: 'new', after: true },
      { kind: 'removed', path: 'old', before: 1 },
    ]);
  });

  it('answers no change for deeply equal documents regardless of key order', () => {
    expect(diffDocuments({ a: 1, b: { c: [1, 2] } }, { b: { c: [1, 2] }, a: 1 })).toEqual([]);
  });

  it('quotes keys that are not identifiers and stops at the limit', () => {
    expect(diffDocuments({ powerW: { 'Q 1': 1 } }, { powerW: { 'Q 1': 2 } })[0].path).toBe('powerW["Q 1"]');
    const many = Object.fromEntries(Array.from({ length: 50 }, (_, i) => [`k${i}`, i]));
    expect(diffDocuments({}, many, 10)).toHaveLength(10);
  });

  it('shows long texts around where they differ', () => {
    const a = 'A linear stage that runs from a 24 V rail with a pulsed load of 0.5 A.';
    const b = 'A linear stage that runs from a 24 V rail with a pulsed load of 0.8 A.';
    const [line] = describeChanges(diffDocuments({ description: a }, { description: b }));
    expect(line).toContain('0.5 A');
    expect(line).toContain('0.8 A');
    expect(line.startsWith('description: "…')).toBe(true);
  });

  it('describes changes in one line each', () => {
    const lines = describeChanges(diffDocuments({ tjMaxC: 150, a: [1] }, { tjMaxC: 175 }));
    expect(lines).toEqual(['a: removed (was [1 items])', 'tjMaxC: 150 → 175']);
  });
});
