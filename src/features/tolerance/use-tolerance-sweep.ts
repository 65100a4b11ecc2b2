import { useMutation } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';

import { errorMessage, fieldErrors } from '@/api';
import type { ToleranceResult } from '@/core/tolerance';
import type { ToleranceInput } from '@/validation/tolerance';

import { sweepOnServer } from './api';
import { startSweepWorker, type SweepWorker } from './sweep-worker';

/** Where a sweep ran: in this browser's Web Worker, or on the server's worker pool. */
export type SweepPlace = 'browser' | 'server';

export type SweepState =
  | { kind: 'idle' }
  | { kind: 'running'; place: SweepPlace; done: number; total: number | null }
  | { kind: 'done'; place: SweepPlace; result: ToleranceResult; seconds: number }
  | { kind: 'failed'; message: string; fields: Record<string, string> };

/**
 * Runs a tolerance sweep of a study: in a Web Worker on the web (with progress), else, or when
 * the worker cannot start, on the server (`POST /api/studies/:id/tolerance`). A new run, or
 * leaving the page, stops the one before.
 */
export function useToleranceSweep(studyId: number, document: unknown) {
  const [state, setState] = useState<SweepState>({ kind: 'idle' });
  const worker = useRef<SweepWorker | null>(null);
  const latest = useRef(0);
  const server = useMutation({ mutationFn: (input: ToleranceInput) => sweepOnServer(studyId, input) });
  const { mutateAsync } = server;

  const stop = useCallback(() => {
    worker.current?.terminate();
    worker.current = null;
  }, []);
  useEffect(() => stop, [stop]);

  const onServer = useCallback(
    async (id: number, input: ToleranceInput, started: number) => {
      setState({ kind: 'running', place: 'server', done: 0, total: null });
      try {
        const result = await mutateAsync(input);
        if (id === latest.current) setState({ kind: 'done', place: 'server', result, seconds: (Date.now() - started) / 1000 });
      } catch (error) {
        if (id === latest.current) setState({ kind: 'failed', message: errorMessage(error), fields: fieldErrors(error) });
      }
    },
    [mutateAsync],
  );

  const run = useCallback(
    (input: ToleranceInput) => {
      const id = ++latest.current;
      const started = Date.now();
      stop();
      const w = startSweepWorker();
      if (!w) return void onServer(id, input, started);
      worker.current = w;
      setState({ kind: 'running', place: 'browser', done: 0, total: null });
      w.onmessage = ({ data }) => {
        if (data.id !== latest.current) return;
        if (data.kind === 'progress') setState({ kind: 'running', place: 'browser', done: data.done, total: data.total });
        else {
          stop();
          if (data.kind === 'done') setState({ kind: 'done', place: 'browser', result: data.result, seconds: (Date.now() - started) / 1000 });
          else setState({ kind: 'failed', message: data.message, fields: data.field ? { [data.field]: data.message.slice(data.field.length + 2) } : {} });
        }
      };
      w.onerror = (event) => {
        event.preventDefault?.();
        // The worker could not load: the server runs this sweep.
        stop();
        if (id === latest.current) void onServer(id, input, started);
      };
      w.postMessage({ id, document, input: { ...input } });
    },
    [document, onServer, stop],
  );

  const cancel = useCallback(() => {
    latest.current++;
    stop();
    setState({ kind: 'idle' });
  }, [stop]);

  return { state, run, cancel };
}
