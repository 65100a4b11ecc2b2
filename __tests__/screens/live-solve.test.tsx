import { act, render, renderHook, screen, within } from '@testing-library/react-native';

import { evaluateStudy, parseStudy } from '@/core/study';
import type { SolveOutcome, SolveReply, SolveRequest } from '@/features/results/solve-outcome';
import { receivedDocument, solveDocument } from '@/features/results/solve-outcome';
import type { SolverChannel } from '@/features/results/solver-channel';
import { StudyResults } from '@/features/results/study-results';
import { useSolve, type SolveState } from '@/features/results/use-solve';
import { useStudyResult, type StudyResultState } from '@/features/results/use-study-result';
import { RESTART_COST_MS, workerChannel, type WorkerLike } from '@/features/results/worker-channel';

/** When set, the hooks' solver channel (a worker channel on fake workers); otherwise the platform's. */
let mockChannel: (() => SolverChannel) | null = null;
jest.mock('@/features/results/solver-channel', () => {
  const actual = jest.requireActual('@/features/results/solver-channel');
  return { ...actual, createSolverChannel: () => (mockChannel ?? actual.createSolverChannel)() };
});

/** A one-device study of a lumped part on a sink at constant power (invented demo data). */
function study(powerW: number) {
  return {
    format: 'junctura-study',
    version: 1,
    title: 'Worker test (demo data)',
    ambient: { temperatureC: 25 },
    sinks: [{ id: 'S1', rthKPerW: 1, capacityJPerK: 50 }],
    devices: [{ id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 0.5 }, interface: { rthKPerW: 0.5 } }],
    profile: { segments: [{ durationS: 1e6, powerW: { Q1: powerW } }] },
  };
}

/** Steady junction temperature Ta + P·ΣRθ of a series thermal path (Ohm's law for heat, common practice). */
const steadyJunctionC = (powerW: number) => 25 + powerW * (0.5 + 0.5 + 1);

/** A Web Worker stand-in that holds its requests until the test answers them, in any order. */
class FakeWorker implements WorkerLike {
  static made: FakeWorker[] = [];
  /** The requests as posted, and as the worker reads them (kept parts filled in from the request before). */
  posted: SolveRequest[] = [];
  requests: SolveRequest[] = [];
  private before: unknown = null;
  terminated = false;
  onmessage: WorkerLike['onmessage'] = null;
  onerror: WorkerLike['onerror'] = null;
  constructor() {
    FakeWorker.made.push(this);
  }
  postMessage(request: SolveRequest) {
    // Through structured clone, as a real worker receives it (HTML standard, structured serialisation).
    const received = structuredClone(request);
    this.posted.push(received);
    // As solver.worker.ts reads it.
    const raw = receivedDocument(received, this.before);
    this.before = raw;
    this.requests.push({ ...received, raw });
  }
  terminate() {
    this.terminated = true;
  }
  /** Answers a request as solver.worker.ts does: the verdict line first when asked, then the outcome (`solveMs` as given). */
  answer(index: number, solveMs?: number) {
    const { id, raw, options } = this.requests[index];
    const send = (reply: SolveReply) => this.onmessage?.({ data: structuredClone(reply) });
    const outcome = solveDocument(raw, options, options.verdictFirst ? (ahead) => send({ id, ahead }) : undefined);
    send({ id, outcome, ...(solveMs !== undefined ? { solveMs } : {}) });
  }
}

/** The workers of a verdict-first result: the verdict line's (asked for verdicts only) and, once started, the full result's. */
function lineWorker(): FakeWorker {
  const line = FakeWorker.made.find((w) => w.requests[0]?.options.verdictOnly === true);
  if (!line) throw new Error('expected a worker for the verdict line');
  return line;
}
function fullWorker(): FakeWorker {
  const line = lineWorker();
  const full = FakeWorker.made.find((w) => w !== line);
  if (!full) throw new Error('expected a worker for the full result');
  return full;
}

const peakOf = (outcome: SolveOutcome) => (outcome.kind === 'ok' ? outcome.result.devices.Q1.peakJunctionC : NaN);

describe('solving off the render path', () => {
  beforeEach(() => {
    FakeWorker.made = [];
  });

  it('keeps only the latest edit’s reply and stops a worker busy with a superseded one', () => {
    const channel = workerChannel(() => new FakeWorker());
    const seen: number[] = [];
    const done = (outcome: ReturnType<typeof solveDocument>) => {
      if (outcome.kind === 'ok') seen.push(outcome.result.devices.Q1.peakJunctionC);
    };
    channel.solve(study(10), {}, done);
    channel.solve(study(20), {}, done);
    const [first, second] = FakeWorker.made;
    // The first worker was still solving: it is ended and a fresh one takes the newer document.
    expect(first.terminated).toBe(true);
    expect(second).toBeDefined();
    // A late reply from the ended worker is dropped; the newer one lands.
    first.answer(0);
    expect(seen).toHaveLength(0);
    second.answer(0);
    expect(seen).toHaveLength(1);
    expect(seen[0]).toBeCloseTo(steadyJunctionC(20), 3);
  });

  it('drops an outdated reply that arrives after a newer request on the same worker', () => {
    const channel = workerChannel(() => new FakeWorker());
    const seen: number[] = [];
    channel.solve(study(10), {}, (o) => o.kind === 'ok' && seen.push(o.result.devices.Q1.peakJunctionC));
    FakeWorker.made[0].answer(0);
    expect(seen[0]).toBeCloseTo(steadyJunctionC(10), 3);
    channel.solve(study(30), {}, (o) => o.kind === 'ok' && seen.push(o.result.devices.Q1.peakJunctionC));
    const worker = FakeWorker.made[0];
    expect(worker.terminated).toBe(false);
    // A second reply to the first request (id 1) must not count as the answer to the second.
    worker.answer(0);
    expect(seen).toHaveLength(1);
    worker.answer(1);
    expect(seen).toEqual([seen[0], expect.closeTo(steadyJunctionC(30), 3)]);
  });

  it('lets a solve expected to end within the restart cost finish, then sends the newer request to the same worker', () => {
    const channel = workerChannel(() => new FakeWorker());
    const seen: number[] = [];
    const done = (o: SolveOutcome) => seen.push(peakOf(o));
    channel.solve(study(10), {}, done);
    // The worker's own time for the first solve: well under the cost of starting a fresh one.
    FakeWorker.made[0].answer(0, RESTART_COST_MS / 3);
    channel.solve(study(20), {}, done);
    channel.solve(study(30), {}, done);
    channel.solve(study(40), {}, done);
    const worker = FakeWorker.made[0];
    expect(FakeWorker.made).toHaveLength(1);
    expect(worker.terminated).toBe(false);
    // Only the latest of the waiting requests is sent, once the one in flight has answered (its reply dropped).
    expect(worker.requests).toHaveLength(2);
    worker.answer(1);
    expect(worker.requests).toHaveLength(3);
    worker.answer(2);
    expect(seen).toHaveLength(2);
    expect(seen[0]).toBeCloseTo(steadyJunctionC(10), 3);
    expect(seen[1]).toBeCloseTo(steadyJunctionC(40), 3);
  });

  it('ends a long solve for a newer request and keeps a spare worker ready for the next time', () => {
    jest.useFakeTimers();
    try {
      const channel = workerChannel(() => new FakeWorker());
      const seen: number[] = [];
      const done = (o: SolveOutcome) => seen.push(peakOf(o));
      channel.solve(study(10), {}, done);
      FakeWorker.made[0].answer(0, 10 * RESTART_COST_MS);
      channel.solve(study(20), {}, done);
      channel.solve(study(30), {}, done);
      const [first, second] = FakeWorker.made;
      expect(first.terminated).toBe(true);
      expect(second.requests).toHaveLength(1);
      second.answer(0, 10 * RESTART_COST_MS);
      expect(seen[1]).toBeCloseTo(steadyJunctionC(30), 3);
      // Once idle, a spare is started; the next restart takes it instead of starting one then.
      jest.runAllTimers();
      expect(FakeWorker.made).toHaveLength(3);
      const spare = FakeWorker.made[2];
      expect(spare.requests).toHaveLength(0);
      channel.solve(study(25), {}, done);
      channel.solve(study(35), {}, done);
      expect(second.terminated).toBe(true);
      expect(FakeWorker.made).toHaveLength(3);
      spare.answer(0);
      expect(seen[2]).toBeCloseTo(steadyJunctionC(35), 3);
      channel.close();
      expect(spare.terminated).toBe(true);
    } finally {
      jest.useRealTimers();
    }
  });

  it('hands over the verdict line ahead of the full result when asked, and drops an outdated one', () => {
    const channel = workerChannel(() => new FakeWorker());
    const events: string[] = [];
    const ahead = (summary: { verdict: { headline: string } }) => events.push(`ahead ${summary.verdict.headline.split(':')[0]}`);
    const done = (o: SolveOutcome) => events.push(`done ${o.kind} ${peakOf(o).toFixed(3)}`);
    channel.solve(study(10), { verdictFirst: true }, done, ahead);
    FakeWorker.made[0].answer(0);
    // Tj = 25 + 10 W × 2 K/W = 45 °C, below the 150 °C Tj,max less the default 20 K margin (Ohm's law for heat, common practice).
    expect(events).toEqual(['ahead Passes', `done ok ${steadyJunctionC(10).toFixed(3)}`]);
    // Superseded before its worker's time is known: that worker is ended and its late replies, verdict line included, are dropped.
    channel.solve(study(100), { verdictFirst: true }, done, ahead);
    channel.solve(study(20), { verdictFirst: true }, done, ahead);
    FakeWorker.made[0].answer(1);
    expect(events).toHaveLength(2);
    FakeWorker.made[1].answer(0);
    expect(events.slice(2)).toEqual(['ahead Passes', `done ok ${steadyJunctionC(20).toFixed(3)}`]);
    // A verdict-only solve answers the line alone, without the result of every segment.
    const only: SolveOutcome[] = [];
    channel.solve(study(100), { verdictOnly: true }, (o) => only.push(o));
    FakeWorker.made[1].answer(1);
    // Tj = 25 + 100 W × 2 K/W = 225 °C: above the 130 °C target, so it fails.
    expect(only).toHaveLength(1);
    expect(only[0].kind).toBe('verdict');
    expect(only[0].kind === 'verdict' && only[0].summary.verdict.passes).toBe(false);
    expect('result' in only[0]).toBe(false);
  });

  it('shows the new verdict line with the last full result until the new full result lands (verdictFirst)', async () => {
    mockChannel = () => workerChannel(() => new FakeWorker());
    try {
      const first = study(10);
      const second = study(100);
      const { result, rerender } = renderHook<StudyResultState, { raw: object }>(({ raw }) => useStudyResult(raw, 0, true), { initialProps: { raw: first } });
      // The verdict line has a worker of its own; the full result's starts once the line is in.
      const line = lineWorker();
      expect(FakeWorker.made).toHaveLength(1);
      await act(async () => line.answer(0));
      const full = fullWorker();
      expect(full.requests).toHaveLength(1);
      await act(async () => full.answer(0));
      expect(result.current.kind).toBe('ok');
      rerender({ raw: second });
      // The verdict line's worker answers first; the full result is asked for only then.
      expect(full.requests).toHaveLength(1);
      await act(async () => line.answer(1));
      expect(full.requests).toHaveLength(2);
      const early = result.current;
      // Tj = 25 + 100 W × 2 K/W = 225 °C, above the 130 °C target: the line fails while the curves still show 10 W (Ohm's law for heat, common practice).
      expect(early.kind).toBe('verdict');
      if (early.kind !== 'verdict') return;
      expect(early.summary.verdict.passes).toBe(false);
      expect(early.updating).toBe(true);
      expect(early.previous?.devices.Q1.peakJunctionC).toBeCloseTo(steadyJunctionC(10), 3);
      await act(async () => full.answer(1));
      const landed = result.current;
      expect(landed.kind === 'ok' && landed.result.devices.Q1.peakJunctionC).toBeCloseTo(steadyJunctionC(100), 3);
      expect(landed.kind === 'ok' && landed.updating).toBe(false);
    } finally {
      mockChannel = null;
    }
  });

  it('never shows an older full result as current while a newer verdict line is known (verdictFirst)', async () => {
    mockChannel = () => workerChannel(() => new FakeWorker());
    try {
      const [a, b, c] = [study(10), study(100), study(20)];
      const { result, rerender } = renderHook<StudyResultState, { raw: object }>(({ raw }) => useStudyResult(raw, 0, true), { initialProps: { raw: a } });
      const line = lineWorker();
      await act(async () => line.answer(0));
      const full = fullWorker();
      await act(async () => full.answer(0));
      rerender({ raw: b });
      await act(async () => line.answer(1));
      // b's full solve is asked for; c comes before it lands.
      rerender({ raw: c });
      const between = result.current;
      // b's line (Tj = 225 °C fails, Ohm's law for heat, common practice) stands, still updating; not a's result (45 °C, passes) as if current.
      expect(between.kind).toBe('verdict');
      expect(between.kind === 'verdict' && between.summary.verdict.passes).toBe(false);
      expect(between.kind === 'verdict' && between.updating).toBe(true);
      await act(async () => line.answer(2));
      const lineC = result.current;
      // c: Tj = 25 + 20 W × 2 K/W = 65 °C, passes.
      expect(lineC.kind === 'verdict' && lineC.summary.verdict.passes).toBe(true);
      expect(lineC.kind === 'verdict' && lineC.updating).toBe(true);
    } finally {
      mockChannel = null;
    }
  });

  it('does not copy the parts an edit left alone to the worker again, and solves the same', () => {
    const channel = workerChannel(() => new FakeWorker());
    const seen: number[] = [];
    const first = study(10);
    channel.solve(first, {}, (o) => seen.push(peakOf(o)));
    const worker = FakeWorker.made[0];
    worker.answer(0);
    // An edit of the ambient, as the form makes it: a new document and ambient, the other parts the same objects.
    const edited = { ...first, ambient: { temperatureC: 45 } };
    channel.solve(edited, {}, (o) => seen.push(peakOf(o)));
    expect(worker.posted[0].kept).toBeUndefined();
    expect(worker.posted[1].kept).toEqual(['sinks', 'devices', 'profile']);
    expect(worker.posted[1].raw).not.toHaveProperty('profile');
    expect(worker.requests[1].raw).toEqual(edited);
    worker.answer(1);
    // 20 K more ambient, 20 K more at the junction: Tj = 45 + 10 W × 2 K/W (Ohm's law for heat, common practice).
    expect(seen[1]).toBeCloseTo(steadyJunctionC(10) + 20, 3);
    // A fresh worker gets the whole document.
    channel.solve(study(20), {}, () => undefined);
    channel.solve({ ...edited, ambient: { temperatureC: 30 } }, {}, () => undefined);
    expect(FakeWorker.made[1].posted[0].kept).toBeUndefined();
  });

  it('sends an edit of a few profile steps as a splice of the worker’s own copy, and solves the same', () => {
    const channel = workerChannel(() => new FakeWorker());
    const seen: number[] = [];
    const solve = (doc: unknown) => channel.solve(doc, {}, (o) => seen.push(peakOf(o)));
    const long = { ...study(10), profile: { segments: Array.from({ length: 40 }, (_, i) => ({ durationS: 100 + i, powerW: { Q1: 10 } })) } };
    solve(long);
    const worker = FakeWorker.made[0];
    worker.answer(0);
    // One step edited (a new array, the other steps the same objects), then one inserted.
    const edited = { ...long, profile: { segments: long.profile.segments.map((s, i) => (i === 12 ? { ...s, powerW: { Q1: 30 } } : s)) } };
    solve(edited);
    worker.answer(1);
    const inserted = { ...edited, profile: { segments: [...edited.profile.segments.slice(0, 30), { durationS: 5, powerW: { Q1: 1 } }, ...edited.profile.segments.slice(30)] } };
    solve(inserted);
    worker.answer(2);
    expect(worker.posted[1].raw).not.toHaveProperty('profile');
    expect(worker.posted[1].profileSplice).toMatchObject({ head: 12, tail: 27, middle: [{ durationS: 112, powerW: { Q1: 30 } }], rest: {} });
    expect(worker.posted[2].profileSplice).toMatchObject({ head: 30, tail: 10, middle: [{ durationS: 5 }] });
    expect(worker.requests[1].raw).toEqual(edited);
    expect(worker.requests[2].raw).toEqual(inserted);
    // The worker's kept steps are its own objects from before (so its parse cache knows them).
    const before = worker.requests[1].raw as typeof long;
    expect((worker.requests[2].raw as typeof long).profile.segments[0]).toBe(before.profile.segments[0]);
    // The spliced documents solve as the whole ones do.
    expect(seen[1]).toBe(peakOf(solveDocument(edited)));
    expect(seen[2]).toBe(peakOf(solveDocument(inserted)));
    // Mostly new steps go whole.
    const fresh = { ...inserted, profile: { segments: inserted.profile.segments.map((s) => ({ ...s })) } };
    solve(fresh);
    expect(worker.posted[3].profileSplice).toBeUndefined();
    expect(worker.requests[3].raw).toEqual(fresh);
  });

  it('shows the verdict line of an edit ahead of its curves and tables, which follow its full result', async () => {
    mockChannel = () => workerChannel(() => new FakeWorker());
    try {
      const view = render(<StudyResults document={study(10)} seriesPoints={50} verdictFirst />);
      const line = lineWorker();
      await act(async () => line.answer(0));
      const full = fullWorker();
      await act(async () => full.answer(0));
      // Tj = 25 + 10 W × 2 K/W = 45 °C (Ohm's law for heat, common practice).
      expect(within(screen.getByLabelText('Devices')).getByText('45\u00a0°C')).toBeVisible();
      view.rerender(<StudyResults document={study(100)} seriesPoints={50} verdictFirst />);
      await act(async () => line.answer(1));
      // Tj = 25 + 100 W × 2 K/W = 225 °C, 95 K over the 130 °C target: the verdict says so while the table still shows the last result.
      expect(screen.getByText(/^Fails: Q1 exceeds its 130\s°C target by 95\sK/)).toBeVisible();
      expect(within(screen.getByLabelText('Devices')).getByText('45\u00a0°C')).toBeVisible();
      expect(screen.getByText('Updating with your latest edit…')).toBeVisible();
      await act(async () => full.answer(1));
      expect(within(screen.getByLabelText('Devices')).getByText('225\u00a0°C')).toBeVisible();
      expect(screen.queryByText('Updating with your latest edit…')).toBeNull();
    } finally {
      mockChannel = null;
    }
  });

  it('solves on the main thread when the worker cannot load', () => {
    jest.useFakeTimers();
    try {
      const channel = workerChannel(() => {
        const w = new FakeWorker();
        w.postMessage = () => setTimeout(() => w.onerror?.({}), 0);
        return w;
      });
      const seen: number[] = [];
      channel.solve(study(15), {}, (o) => o.kind === 'ok' && seen.push(o.result.devices.Q1.peakJunctionC));
      jest.runAllTimers();
      expect(seen).toHaveLength(1);
      expect(seen[0]).toBeCloseTo(steadyJunctionC(15), 3);
    } finally {
      jest.useRealTimers();
    }
  });

  it('gives a result that survives structured clone unchanged', () => {
    const result = evaluateStudy(parseStudy(study(12)));
    // Structured clone keeps plain objects, arrays and typed arrays but no functions or class prototypes (HTML standard).
    expect(structuredClone(result)).toEqual(result);
  });

  it('keeps the last result while a newer document is solved, then shows the newer one', async () => {
    jest.useFakeTimers();
    try {
      const first = study(10);
      const second = study(40);
      const { result, rerender } = renderHook<SolveState, { raw: object }>(({ raw }) => useSolve(raw, {}), { initialProps: { raw: first } });
      await act(async () => {
        jest.runAllTimers();
      });
      expect(result.current.updating).toBe(false);
      expect(result.current.outcome?.kind === 'ok' && result.current.outcome.result.devices.Q1.peakJunctionC).toBeCloseTo(steadyJunctionC(10), 3);

      rerender({ raw: second });
      // Solving the newer document: the older answer stays, marked as updating.
      expect(result.current.updating).toBe(true);
      expect(result.current.solvedFor).toBe(first);
      // A third edit supersedes the second before it is solved: only the third lands.
      const third = study(5);
      rerender({ raw: third });
      await act(async () => {
        jest.runAllTimers();
      });
      expect(result.current.updating).toBe(false);
      expect(result.current.solvedFor).toBe(third);
      expect(result.current.outcome?.kind === 'ok' && result.current.outcome.result.devices.Q1.peakJunctionC).toBeCloseTo(steadyJunctionC(5), 3);
    } finally {
      jest.useRealTimers();
    }
  });
});
