import { useEffect, useRef, useState } from 'react';

import type { SolveOptions, SolveOutcome } from './solve-outcome';
import { createSolverChannel, type SolverChannel } from './solver-channel';

export type SolveState = {
  /** The outcome of the latest document solved so far (kept while a newer one is solved). */
  outcome: SolveOutcome | null;
  /** The document `outcome` belongs to. */
  solvedFor: object | null;
  /** A newer document than `solvedFor` is being solved. */
  updating: boolean;
};

/** Drops everything but the reply to the latest request: a newer edit's result always wins. */
export type Supersede = { next(): number; isLatest(id: number): boolean };

export function supersede(): Supersede {
  let latest = 0;
  return { next: () => ++latest, isLatest: (id) => id === latest };
}

/**
 * Solves `raw` off the render path (a Web Worker on the web, a timer elsewhere) each time it
 * changes to a new object, superseding the solve in flight. Edits are already debounced by
 * the editor's check (CHECK_DELAY_MS); `known` answers documents solved before without a solve.
 */
export function useSolve(raw: object | null, options: SolveOptions, enabled = true, known?: (raw: object) => SolveOutcome | undefined, onSolved?: (raw: object, outcome: SolveOutcome) => void): SolveState {
  const [state, setState] = useState<{ outcome: SolveOutcome | null; solvedFor: object | null }>({ outcome: null, solvedFor: null });
  const channel = useRef<SolverChannel | null>(null);
  const order = useRef<Supersede>(supersede());
  const seriesPoints = options.seriesPoints;

  useEffect(
    () => () => {
      channel.current?.close();
      channel.current = null;
    },
    [],
  );

  useEffect(() => {
    if (!enabled || raw === null) return;
    const id = order.current.next();
    if (known?.(raw)) {
      channel.current?.cancel();
      return;
    }
    channel.current ??= createSolverChannel();
    channel.current.solve(raw, { seriesPoints }, (outcome) => {
      if (!order.current.isLatest(id)) return;
      onSolved?.(raw, outcome);
      setState({ outcome, solvedFor: raw });
    });
    // `known` and `onSolved` are read at the time of each solve; a new function does not start one.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [raw, enabled, seriesPoints]);

  const cached = raw !== null ? known?.(raw) : undefined;
  if (cached) return { outcome: cached, solvedFor: raw, updating: false };
  return { ...state, updating: enabled && raw !== null && state.solvedFor !== raw };
}
