import { evaluateStudy, parseStudy } from '../../../src/core/study';
import { seededRandom } from '../../helpers/seeded-random';

/**
 * The solver fuzzed with random studies: valid ones always give finite temperatures and at
 * least the ambient; mutated ones are always refused with a RangeError or TypeError that starts
 * with a field path — never NaN, never a hang, never another kind of error.
 */
type Rng = () => number;
const pick = <T>(r: Rng, xs: T[]) => xs[Math.floor(r() * xs.length)];
const between = (r: Rng, a: number, b: number) => a + (b - a) * r();
const logBetween = (r: Rng, a: number, b: number) => a * (b / a) ** r();

function randomPackage(r: Rng) {
  const kind = pick(r, ['foster', 'cauer', 'lumped']);
  const n = 1 + Math.floor(r() * 5);
  if (kind === 'foster') return { kind, terms: Array.from({ length: n }, () => ({ rKPerW: logBetween(r, 0.01, 2), tauS: logBetween(r, 1e-4, 10) })) };
  if (kind === 'cauer') return { kind, stages: Array.from({ length: n }, () => ({ rKPerW: logBetween(r, 0.01, 2), capacityJPerK: logBetween(r, 1e-2, 5) })) };
  return r() < 0.5 ? { kind, rthKPerW: logBetween(r, 0.1, 5) } : { kind, rthKPerW: logBetween(r, 0.1, 5), capacityJPerK: logBetween(r, 0.01, 5) };
}

function randomStudy(r: Rng) {
  const sinkCount = 1 + Math.floor(r() * 2);
  const sinks = Array.from({ length: sinkCount }, (_, i) => ({
    id: `S${i + 1}`,
    rthKPerW: logBetween(r, 0.2, 20),
    capacityJPerK: logBetween(r, 1, 2000),
    ...(r() < 0.3 ? { naturalConvection: { referenceRiseK: between(r, 20, 80) } } : {}),
  }));
  const deviceCount = 1 + Math.floor(r() * 3);
  const devices = Array.from({ length: deviceCount }, (_, i) => {
    const pkg = randomPackage(r);
    // A shutdown needs heat capacity at the junction (the parser refuses it otherwise).
    const canShutDown = pkg.kind !== 'lumped' || 'capacityJPerK' in pkg;
    return {
      id: `Q${i + 1}`,
      tjMaxC: between(r, 125, 175),
      sink: pick(r, sinks).id,
      count: 1 + Math.floor(r() * 3),
      package: pkg,
      interface: { rthKPerW: logBetween(r, 0.05, 2) },
      electrical: { iqA: r() < 0.5 ? 0 : logBetween(r, 1e-4, 0.02), ...(canShutDown && r() < 0.3 ? { thermalShutdown: { tripC: between(r, 150, 175), hysteresisK: between(r, 5, 25) } } : {}) },
    };
  });
  const segments = Array.from({ length: 1 + Math.floor(r() * 30) }, () =>
    r() < 0.5
      ? { durationS: logBetween(r, 1e-3, 600), powerW: Object.fromEntries(devices.map((d) => [d.id, between(r, 0, 40)])) }
      : { durationS: logBetween(r, 1e-3, 600), vinV: between(r, 5, 40), voutV: between(r, 1, 30), iloadA: between(r, 0, 5) },
  );
  return {
    format: 'junctura-study',
    version: 1,
    title: 'fuzz',
    marginK: between(r, 0, 30),
    ambient: { temperatureC: between(r, -20, 60) },
    sinks,
    devices,
    profile: { segments, repeat: 1 + Math.floor(r() * 3), ...(r() < 0.3 ? { periodic: true } : {}) },
  };
}

/** Replaces one number somewhere in the document with a value that must be refused. */
function mutate(r: Rng, doc: unknown): { doc: unknown; path: string } {
  const paths: string[][] = [];
  const walk = (v: unknown, p: string[]) => {
    if (typeof v === 'number') paths.push(p);
    else if (Array.isArray(v)) v.forEach((x, i) => walk(x, [...p, String(i)]));
    else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, [...p, k]);
  };
  walk(doc, []);
  const target = pick(r, paths.filter((p) => !['version', 'marginK', 'temperatureC'].includes(p[p.length - 1]) && !p.includes('ambient')));
  const copy = JSON.parse(JSON.stringify(doc));
  let o = copy;
  for (const k of target.slice(0, -1)) o = o[k];
  o[target[target.length - 1]] = pick(r, [Number.NaN, Infinity, -Infinity, -1, 'text', null]);
  return { doc: copy, path: target.join('.') };
}

function allNumbers(v: unknown, out: number[] = []): number[] {
  if (typeof v === 'number') out.push(v);
  else if (Array.isArray(v)) v.forEach((x) => allNumbers(x, out));
  else if (v && typeof v === 'object') Object.values(v).forEach((x) => allNumbers(x, out));
  return out;
}

describe('evaluateStudy under fuzzing', () => {
  it('solves 60 random valid studies with finite results at or above the lowest ambient, or refuses one with a precise reason', () => {
    const r = seededRandom(20261201);
    let solved = 0;
    for (let i = 0; i < 60; i++) {
      const json = randomStudy(r);
      let result;
      try {
        result = evaluateStudy(parseStudy(json), { seriesPoints: 64, maxStretches: 20_000 });
      } catch (err) {
        // A valid study may still be beyond what the solver takes on (e.g. shutdown cycling
        // at kilohertz rates for minutes): that must be a RangeError naming the field.
        expect(err).toBeInstanceOf(RangeError);
        expect((err as Error).message).toMatch(/^[\w[\].]+: /);
        continue;
      }
      solved++;
      for (const d of Object.values(result.devices)) {
        expect(Number.isFinite(d.peakJunctionC)).toBe(true);
        expect(d.peakJunctionC).toBeGreaterThanOrEqual(json.ambient.temperatureC - 1e-9);
        expect(Number.isFinite(d.peakTimeS)).toBe(true);
      }
      const numbers = allNumbers({ devices: result.devices, sinks: result.sinks, series: result.series });
      expect(numbers.every((x) => !Number.isNaN(x))).toBe(true);
    }
    expect(solved).toBeGreaterThan(50);
  });

  it('refuses 300 mutated studies with a RangeError or TypeError that names a field (the parser catches them)', () => {
    const r = seededRandom(7);
    let refused = 0;
    for (let i = 0; i < 300; i++) {
      const { doc } = mutate(r, randomStudy(r));
      try {
        evaluateStudy(parseStudy(doc), { seriesPoints: 64, maxStretches: 20_000 });
      } catch (err) {
        expect(err instanceof RangeError || err instanceof TypeError).toBe(true);
        expect((err as Error).message).toMatch(/^[\w[\].]+: /);
        refused++;
        continue;
      }
      throw new Error(`a mutated study was accepted: ${JSON.stringify(doc).slice(0, 300)}`);
    }
    expect(refused).toBe(300);
  });

  it('refuses a thermal shutdown on a junction without heat capacity, which would cycle without end', () => {
    const json = randomStudy(seededRandom(11));
    json.devices[0].package = { kind: 'lumped', rthKPerW: 1 };
    (json.devices[0].electrical as Record<string, unknown>).thermalShutdown = { tripC: 150, hysteresisK: 10 };
    expect(() => parseStudy(json)).toThrow(/^devices\[0\]\.electrical\.thermalShutdown: needs heat capacity/);
  });

  it('refuses a profile too large to solve, saying so, instead of hanging', () => {
    const json = randomStudy(seededRandom(3));
    (json.profile as Record<string, unknown>).repeat = 1e9;
    expect(() => evaluateStudy(parseStudy(json))).toThrow(/profile|segments|pieces/);
  });
});
