import type { SweepReply, SweepRequest } from './tolerance-messages';

/** What the sweep needs of a Web Worker. */
export type SweepWorker = {
  postMessage(request: SweepRequest): void;
  terminate(): void;
  onmessage: ((event: { data: SweepReply }) => void) | null;
  onerror: ((event: { preventDefault?: () => void }) => void) | null;
};

/** Native and tests have no Web Worker: sweeps go to the server. */
export function startSweepWorker(): SweepWorker | null {
  return null;
}
