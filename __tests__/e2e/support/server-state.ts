/** What globalSetup hands to the tests and to globalTeardown, through the environment. */
export type ServerState = {
  pid: number;
  baseUrl: string;
  tmpDir: string;
  logFile: string;
};

export function saveServerState(state: ServerState): void {
  process.env.JUNCTURA_E2E_SERVER = JSON.stringify(state);
}

export function loadServerState(): ServerState {
  const raw = process.env.JUNCTURA_E2E_SERVER;
  if (!raw) throw new Error('JUNCTURA_E2E_SERVER is not set: run these tests with jest -c jest.e2e.config.js');
  return JSON.parse(raw) as ServerState;
}

/** Sends a signal to the server's whole process group (npm, tsx, node and any export run). */
export function signalGroup(pid: number, signal: NodeJS.Signals | 0): boolean {
  try {
    process.kill(-pid, signal);
    return true;
  } catch {
    return false;
  }
}
