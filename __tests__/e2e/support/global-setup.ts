import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

import { saveServerState, signalGroup, type ServerState } from './server-state';

const ROOT = path.resolve(__dirname, '..', '..', '..');
// A cold web export takes about a minute on two cores; migrations and seeding follow.
const READY_TIMEOUT_MS = 8 * 60_000;
const POLL_MS = 500;

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.unref();
    probe.on('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

function logTail(file: string, lines = 40): string {
  try {
    return fs.readFileSync(file, 'utf8').split('\n').slice(-lines).join('\n');
  } catch {
    return '(no server log)';
  }
}

async function waitForHealth(state: ServerState, exited: () => number | null): Promise<void> {
  const deadline = Date.now() + READY_TIMEOUT_MS;
  while (Date.now() < deadline) {
    const code = exited();
    if (code !== null) throw new Error(`npm start exited with code ${code} before it was ready:\n${logTail(state.logFile)}`);
    try {
      const response = await fetch(`${state.baseUrl}/api/health`);
      if (response.ok && (await response.json()).ok === true) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((resolve) => setTimeout(resolve, POLL_MS));
  }
  throw new Error(`Server not healthy after ${READY_TIMEOUT_MS / 1000} s:\n${logTail(state.logFile)}`);
}

/** Starts the product exactly as a user does (`npm start`) against a throw-away database. */
export default async function globalSetup(): Promise<void> {
  const tmpDir = fs.mkdtempSync(path.join(os.tmpdir(), 'junctura-e2e-'));
  const port = await freePort();
  const logFile = path.join(tmpDir, 'server.log');
  const log = fs.openSync(logFile, 'a');

  // Jest sets NODE_ENV=test; start the server the way `npm start` runs for a user.
  const inherited = Object.fromEntries(Object.entries(process.env).filter(([key]) => key !== 'NODE_ENV'));
  const env: NodeJS.ProcessEnv = {
    ...(inherited as NodeJS.ProcessEnv),
    PORT: String(port),
    HOST: '127.0.0.1',
    DATABASE_URL: `sqlite:${path.join(tmpDir, 'e2e.sqlite')}`,
    SESSION_SECRET: randomBytes(32).toString('hex'),
    // The whole suite signs in more often than a person would in 15 minutes.
    AUTH_RATE_LIMIT: '10000',
  };

  const child = spawn('npm', ['start'], { cwd: ROOT, env, detached: true, stdio: ['ignore', log, log] });
  fs.closeSync(log);
  let exitCode: number | null = null;
  child.on('exit', (code, signal) => {
    exitCode = code ?? (signal ? 128 : 1);
  });
  if (child.pid === undefined) throw new Error('Could not start npm start');

  const state: ServerState = { pid: child.pid, baseUrl: `http://127.0.0.1:${port}`, tmpDir, logFile };
  saveServerState(state);
  try {
    await waitForHealth(state, () => exitCode);
  } catch (error) {
    // globalTeardown does not run when setup fails; the error already carries the log tail.
    signalGroup(child.pid, 'SIGKILL');
    fs.rmSync(tmpDir, { recursive: true, force: true });
    throw error;
  }
}
