import { act, renderHook } from '@testing-library/react-native';

import { evaluateStudy, parseStudy } from '@/core/study';
import type { SolveReply, SolveRequest } from '@/features/results/solve-outcome';
import { solveDocument } from '@/features/results/solve-outcome';
import { useSolve, type SolveState } from '@/features/results/use-solve';
import { workerChannel, type WorkerLike } from '@/features/results/worker-channel';

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
  requests: SolveRequest[] = [];
  terminated = false;
  onmessage: WorkerLike['onmessage'] = null;
  onerror: WorkerLike['onerror'] = null;
  constructor() {
    FakeWorker.made.push(this);
  }
  postMessage(request: SolveRequest) {
    // Through structured clone, as a real worker receives it (HTML standard, structured serialisation).
    this.requests.push(structuredClone(request));
  }
  terminate() {
    this.terminated = true;
  }
  answer(index: number) {
    const { id, raw, options } = this.requests[index];
    const reply: SolveReply = structuredClone({ id, outcome: solveDocument(raw, options) });
    this.onmessage?.({ data: reply });
  }
}

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
