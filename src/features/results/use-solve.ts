import { useEffect, useLayoutEffect, useRef, useState } from 'react';

import type { SolveOptions, SolveOutcome } from './solve-outcome';
import { createSolverChannel, type SolverChannel } from './solver-channel';
import type { VerdictSummary } from './verdict-summary';

export type SolveState = {
  /** The outcome of the latest document solved so far (kept while a newer one is solved). */
  outcome: SolveOutcome | null;
  /** The document `outcome` belongs to. */
  solvedFor: object | null;
  /** A newer document than `solvedFor` is being solved. */
  updating: boolean;
  /** With `verdictFirst`: the verdict line of the document being solved, sent ahead of its outcome. */
  ahead: VerdictSummary | null;
};

type Held = { outcome: SolveOutcome | null; solvedFor: object | null; ahead: VerdictSummary | null; aheadFor: object | null };

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
 * With `verdictFirst`, `ahead` holds the new document's verdict line once it is known, while
 * `outcome` still holds the last full one.
 */
export function useSolve(raw: object | null, options: SolveOptions, enabled = true, known?: (raw: object) => SolveOutcome | undefined, onSolved?: (raw: object, outcome: SolveOutcome) => void): SolveState {
  const [state, setState] = useState<Held>({ outcome: null, solvedFor: null, ahead: null, aheadFor: null });
  const channel = useRef<SolverChannel | null>(null);
  const order = useRef<Supersede>(supersede());
  const { seriesPoints, verdictOnly, verdictFirst } = options;

  useEffect(
    () => () => {
      channel.current?.close();
      channel.current = null;
    },
    [],
  );

  // Sent as the new document commits, before the browser paints: a passive effect would wait a frame.
  useLayoutEffect(() => {
    if (!enabled || raw === null) return;
    const id = order.current.next();
    if (known?.(raw)) {
      channel.current?.cancel();
      return;
    }
    channel.current ??= createSolverChannel();
    channel.current.solve(
      raw,
      { seriesPoints, verdictOnly, verdictFirst },
      (outcome) => {
        if (!order.current.isLatest(id)) return;
        onSolved?.(raw, outcome);
        setState({ outcome, solvedFor: raw, ahead: null, aheadFor: null });
      },
      verdictFirst
        ? (ahead) => {
            if (order.current.isLatest(id)) setState((s) => ({ ...s, ahead, aheadFor: raw }));
          }
        : undefined,
    );
    // `known` and `onSolved` are read at the time of each solve; a new function does not start one.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [raw, enabled, seriesPoints, verdictOnly, verdictFirst]);

  const cached = raw !== null ? known?.(raw) : undefined;
  if (cached) return { outcome: cached, solvedFor: raw, updating: false, ahead: null };
  const updating = enabled && raw !== null && state.solvedFor !== raw;
  return { outcome: state.outcome, solvedFor: state.solvedFor, updating, ahead: updating && state.aheadFor === raw ? state.ahead : null };
}
