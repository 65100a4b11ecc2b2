import { parseStudy, type StudyDocument } from '@/core/study';
import { solveParsed } from '@/features/results/solve-outcome';
import {
  createPrimer,
  PRIME_BUDGET_MS,
  PRIME_MIN_SOLVE_MS,
  PRIME_RUNS,
  PRIME_SEGMENTS,
  PRIME_TASK_MAX_MS,
  primingDocument,
  type PrimerHost,
} from '@/features/results/solver-priming';

/** A one-device study of a lumped part on a sink, `segments` steps of changing power (invented demo data). */
function study(segments: number, extra: Record<string, unknown> = {}) {
  return parseStudy({
    format: 'junctura-study',
    version: 1,
    title: 'Priming test (demo data)',
    ambient: { temperatureC: 25 },
    sinks: [{ id: 'S1', rthKPerW: 1, capacityJPerK: 50 }],
    devices: [{ id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 0.5 }, interface: { rthKPerW: 0.5 } }],
    profile: { segments: Array.from({ length: segments }, (_, i) => ({ durationS: 1 + (i % 3), powerW: { Q1: 5 + (i % 11) } })), ...extra },
  });
}

/** A host whose tasks run when the test says and whose clock moves by `costMs` per solve. */
function fakeHost(costMs: (run: number) => number = () => 10) {
  let clock = 0;
  const tasks = new Map<number, () => void>();
  let next = 1;
  const solved: { document: StudyDocument; options: string }[] = [];
  const host: PrimerHost<string> = {
    schedule: (task) => {
      tasks.set(next, task);
      return next++;
    },
    cancel: (handle) => void tasks.delete(handle as number),
    now: () => clock,
    solve: (document, options) => {
      clock += costMs(solved.length);
      solved.push({ document, options });
    },
  };
  /** Runs queued tasks (and the ones they queue) up to `limit` of them; returns how many ran. */
  const drain = (limit = Infinity) => {
    let ran = 0;
    while (tasks.size > 0 && ran < limit) {
      const [id, task] = tasks.entries().next().value as [number, () => void];
      tasks.delete(id);
      task();
      ran++;
    }
    return ran;
  };
  return { host, solved, drain, pending: () => tasks.size };
}

describe('priming a fresh solver worker on a long study', () => {
  it('solves a cut copy of the study, once through, in tasks of its own until PRIME_RUNS', () => {
    const { host, solved, drain } = fakeHost();
    const primer = createPrimer(host);
    const doc = study(5000, { repeat: 3 });
    primer.solved(doc, 'verdict', 80);
    expect(solved).toHaveLength(0); // nothing runs inside the request's own task
    expect(drain()).toBe(PRIME_RUNS);
    expect(solved).toHaveLength(PRIME_RUNS);
    for (const s of solved) {
      expect(s.options).toBe('verdict');
      expect(s.document.profile.segments).toHaveLength(PRIME_SEGMENTS);
      expect(s.document.profile.repeat).toBe(1);
      expect(s.document.profile.periodic).toBe(false);
      expect(s.document.profile.segments[0]).toBe(doc.profile.segments[0]);
    }
    expect(doc.profile.segments).toHaveLength(5000); // the study itself is left as it was
    // Used up: later solves of the same worker prime no more.
    primer.solved(doc, 'verdict', 80);
    expect(drain()).toBe(0);
    expect(primer.runs).toBe(PRIME_RUNS);
  });

  it('ends for good when a request comes in: a worker primes once, in one burst', () => {
    const { host, solved, drain, pending } = fakeHost();
    const primer = createPrimer(host);
    const doc = study(3000);
    primer.interrupt(); // a request before any priming changes nothing
    primer.solved(doc, 'verdict', 60);
    drain(5);
    expect(solved).toHaveLength(5);
    primer.interrupt();
    expect(pending()).toBe(0);
    // Later solves of the same worker do not prime again.
    primer.solved(doc, 'full', 90);
    expect(drain()).toBe(0);
    expect(primer.runs).toBe(5);
  });

  it('leaves short or quickly solved studies alone', () => {
    const { host, drain } = fakeHost();
    const primer = createPrimer(host);
    primer.solved(study(PRIME_SEGMENTS), 'verdict', 500);
    primer.solved(study(4000), 'verdict', PRIME_MIN_SOLVE_MS - 1);
    expect(drain()).toBe(0);
  });

  it('ends priming after a slow priming solve, at its time budget, or when a solve throws', () => {
    const slow = fakeHost(() => PRIME_TASK_MAX_MS + 1);
    const a = createPrimer(slow.host);
    a.solved(study(2000), 'verdict', 100);
    expect(slow.drain()).toBe(1);
    a.solved(study(2000), 'verdict', 100);
    expect(slow.drain()).toBe(0);

    const steady = fakeHost(() => PRIME_TASK_MAX_MS - 1);
    const b = createPrimer(steady.host);
    b.solved(study(2000), 'verdict', 100);
    steady.drain();
    expect(steady.solved).toHaveLength(Math.min(PRIME_RUNS, Math.ceil(PRIME_BUDGET_MS / (PRIME_TASK_MAX_MS - 1))));
    expect(b.spentMs).toBeGreaterThanOrEqual(Math.min(PRIME_BUDGET_MS, PRIME_RUNS * (PRIME_TASK_MAX_MS - 1)));

    const failing = fakeHost();
    const c = createPrimer({ ...failing.host, solve: () => { throw new RangeError('too much work'); } });
    c.solved(study(2000), 'verdict', 100);
    expect(failing.drain()).toBe(1);
    expect(c.runs).toBe(0);
  });

  it('primes on a study the solver accepts: the cut copy solves to a verdict of its own', () => {
    const doc = study(4000);
    const cut = primingDocument(doc);
    const outcome = solveParsed(cut, { verdictOnly: true });
    expect(outcome.kind).toBe('verdict');
    // The cut copy covers the first PRIME_SEGMENTS steps: 1 + (i % 3) s each.
    const durationS = cut.profile.segments.reduce((sum, s) => sum + s.durationS, 0);
    expect(durationS).toBe(Array.from({ length: PRIME_SEGMENTS }, (_, i) => 1 + (i % 3)).reduce((x, y) => x + y, 0));
  });
});
