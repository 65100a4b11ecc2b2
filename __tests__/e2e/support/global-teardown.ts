import fs from 'node:fs';

import { loadServerState, signalGroup } from './server-state';

const STOP_TIMEOUT_MS = 10_000;

/** Stops the server's process group and removes the temporary database. */
export default async function globalTeardown(): Promise<void> {
  const state = loadServerState();
  if (signalGroup(state.pid, 'SIGTERM')) {
    const deadline = Date.now() + STOP_TIMEOUT_MS;
    while (signalGroup(state.pid, 0) && Date.now() < deadline) {
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    signalGroup(state.pid, 'SIGKILL');
  }
  fs.rmSync(state.tmpDir, { recursive: true, force: true });
}
