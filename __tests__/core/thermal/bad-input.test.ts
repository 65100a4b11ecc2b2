import {
  advance,
  compileNetwork,
  cauerToFoster,
  firstCrossing,
  fosterToCauer,
  fosterZth,
  nodesWithoutAmbientPath,
  periodicStart,
  runProfile,
  zth,
} from '@/core/thermal';
import type { NetworkSpec } from '@/core/thermal';

const good: NetworkSpec = {
  nodes: [
    { id: 'j', capacityJPerK: 0.1 },
    { id: 's', capacityJPerK: 100 },
  ],
  links: [
    { a: 'j', b: 's', rKPerW: 1 },
    { a: 's', b: 'ambient', rKPerW: 2 },
  ],
  heatInputs: ['j'],
};
const withLink = (i: number, patch: object): NetworkSpec => ({
  ...good,
  links: good.links.map((l, k) => (k === i ? { ...l, ...patch } : l)),
});
const withNode = (i: number, patch: object): NetworkSpec => ({
  ...good,
  nodes: good.nodes.map((n, k) => (k === i ? { ...n, ...patch } : n)),
});

describe('bad networks', () => {
  it.each([
    ['zero resistance', withLink(1, { rKPerW: 0 }), RangeError, /^links\[1\]\.rKPerW: must be > 0/],
    ['negative resistance', withLink(0, { rKPerW: -1 }), RangeError, /^links\[0\]\.rKPerW/],
    ['NaN resistance', withLink(0, { rKPerW: NaN }), RangeError, /^links\[0\]\.rKPerW: must be finite/],
    ['infinite resistance', withLink(1, { rKPerW: Infinity }), RangeError, /^links\[1\]\.rKPerW: must be finite/],
    ['resistance as a string', withLink(1, { rKPerW: '2' }), TypeError, /^links\[1\]\.rKPerW: expected a number/],
    ['negative capacity', withNode(1, { capacityJPerK: -5 }), RangeError, /^nodes\[1\]\.capacityJPerK/],
    ['infinite capacity', withNode(0, { capacityJPerK: Infinity }), RangeError, /^nodes\[0\]\.capacityJPerK/],
    ['unknown node in a link', withLink(0, { b: 'sink' }), RangeError, /^links\[0\]\.b: unknown node "sink"/],
    ['self link', withLink(0, { b: 'j' }), RangeError, /^links\[0\]\.b/],
    ['duplicate id', withNode(1, { id: 'j' }), RangeError, /^nodes\[1\]\.id: duplicate id "j"/],
    ['reserved id', withNode(0, { id: 'ambient' }), RangeError, /^nodes\[0\]\.id/],
    ['unknown heat input', { ...good, heatInputs: ['q9'] }, RangeError, /^heatInputs\[0\]: unknown node "q9"/],
    ['no path to ambient', { ...good, links: [good.links[0]] }, RangeError, /^nodes\[0\]: node "j" has no path to ambient/],
    ['links not an array', { ...good, links: null }, TypeError, /^links: expected an array/],
  ])('%s', (_, spec, kind, message) => {
    expect(() => compileNetwork(spec as NetworkSpec)).toThrow(kind);
    expect(() => compileNetwork(spec as NetworkSpec)).toThrow(message);
  });

  it('nodesWithoutAmbientPath lists stranded nodes before compiling', () => {
    const island: NetworkSpec = {
      ...good,
      nodes: [...good.nodes, { id: 'x', capacityJPerK: 1 }, { id: 'y', capacityJPerK: 1 }],
      links: [...good.links, { a: 'x', b: 'y', rKPerW: 1 }],
    };
    expect(nodesWithoutAmbientPath(island)).toEqual(['x', 'y']);
    expect(nodesWithoutAmbientPath(good)).toEqual([]);
  });

  it('a network too stiff to resolve names the fast node', () => {
    const stiff = withNode(0, { capacityJPerK: 1e-12 });
    expect(() => compileNetwork(stiff)).toThrow(/^nodes\[0\]\.capacityJPerK: time constants span/);
  });
});

describe('bad solver arguments', () => {
  const model = compileNetwork(good);
  it.each([
    ['negative duration', () => advance(model, [25, 25], [1, 25], -1), RangeError, /^h: must be ≥ 0/],
    ['NaN power', () => advance(model, [25, 25], [NaN, 25], 1), RangeError, /^u\[0\]: must be finite/],
    ['short input vector', () => advance(model, [25, 25], [1], 1), RangeError, /^u: expected 2 values/],
    ['infinite start temperature', () => advance(model, [25, Infinity], [1, 25], 1), RangeError, /^temperatures\[1\]/],
    ['node index out of range', () => zth(model, 0, 5, 1), RangeError, /^nodeIndex: index 5 out of range/],
    ['power input index out of range', () => zth(model, 1, 0, 1), RangeError, /^inputIndex/],
    ['bad direction', () => firstCrossing(model, [25, 25], [1, 25], 1, 0, 30, 'sideways' as 'up'), TypeError, /^direction/],
    ['zero-length period', () => periodicStart(model, [{ u: [1, 25], h: 0 }]), RangeError, /^segments: a periodic profile needs/],
    ['negative segment length', () => periodicStart(model, [{ u: [1, 25], h: -2 }]), RangeError, /^segments\[0\]\.h/],
  ])('%s', (_, call, kind, message) => {
    expect(call).toThrow(kind);
    expect(call).toThrow(message);
  });

  it.each([
    ['negative duration', { durations: [1, -1], inputs: [1, 25, 1, 25] }, RangeError, /^profile\.durations\[1\]: must be finite and ≥ 0/],
    ['infinite duration', { durations: [Infinity], inputs: [1, 25] }, RangeError, /^profile\.durations\[0\]/],
    ['NaN input', { durations: [1, 1], inputs: [1, 25, NaN, 25] }, RangeError, /^profile\.inputs\[2\]: must be finite/],
    ['wrong input count', { durations: [1, 1], inputs: [1, 25, 1] }, RangeError, /^profile\.inputs: expected 2 × 2 = 4 values/],
    ['empty profile', { durations: [], inputs: [] }, RangeError, /^profile\.durations: at least one segment/],
  ])('runProfile: %s', (_, profile, kind, message) => {
    expect(() => runProfile(model, profile)).toThrow(kind);
    expect(() => runProfile(model, profile)).toThrow(message);
  });

  it('runProfile rejects an unknown watched node', () => {
    expect(() => runProfile(model, { durations: [1], inputs: [1, 25] }, { watchNodes: [2] })).toThrow(/^options\.watchNodes\[0\]/);
  });
});

describe('bad package data', () => {
  it.each([
    ['zero τ', () => fosterToCauer([{ rKPerW: 1, tauS: 0 }]), RangeError, /^terms\[0\]\.tauS: must be > 0/],
    ['negative R', () => fosterZth([{ rKPerW: 1, tauS: 1 }, { rKPerW: -1, tauS: 2 }], 1), RangeError, /^terms\[1\]\.rKPerW/],
    ['no terms', () => fosterToCauer([]), RangeError, /^terms: at least one term/],
    ['NaN capacity', () => cauerToFoster([{ rKPerW: 1, capacityJPerK: NaN }]), RangeError, /^stages\[0\]\.capacityJPerK/],
    ['negative time', () => fosterZth([{ rKPerW: 1, tauS: 1 }], -1), RangeError, /^t: must be ≥ 0/],
  ])('%s', (_, call, kind, message) => {
    expect(call).toThrow(kind);
    expect(call).toThrow(message);
  });
});
