import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const port = (s.address() as net.AddressInfo).port;
      s.close(() => resolve(port));
    });
  });
}

/**
 * `stop` ends the process and keeps its database (a crash test starts it again with `restart`);
 * `close` stops it and removes the temporary folder it made for its database, if it made one.
 */
export type TestServer = { url: string; dbFile: string; child: ChildProcess; stop: (signal?: NodeJS.Signals) => Promise<void>; restart: () => Promise<void>; close: () => Promise<void> };

/**
 * Starts the real API server (no web export) in its own process on a free loopback port with
 * a fresh database, seeded with the demo data, for load and crash scripts. `databaseUrl`
 * (e.g. postgres://…) replaces the SQLite file; several servers may share one database.
 */
export async function startTestServer(options: { dbFile?: string; databaseUrl?: string } = {}): Promise<TestServer> {
  const tmpDir = options.dbFile ? null : fs.mkdtempSync(path.join(os.tmpdir(), 'junctura-load-'));
  const dbFile = options.dbFile ?? path.join(tmpDir!, 'load.sqlite');
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const env = {
    ...process.env,
    NODE_ENV: 'development' as const,
    PORT: String(port),
    HOST: '127.0.0.1',
    DATABASE_URL: options.databaseUrl ?? `sqlite:${dbFile}`,
    SESSION_SECRET: 'load-test-secret-load-test-secret-00',
    BCRYPT_COST: '10',
    AUTH_RATE_LIMIT: '100000',
    WEB_DIR: path.join(path.dirname(dbFile), 'no-web'),
  };
  const root = path.resolve(__dirname, '..', '..');
  const state = { child: undefined as unknown as ChildProcess };

  const launch = async () => {
    state.child = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'server', 'index.ts')], { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] });
    let log = '';
    state.child.stdout!.on('data', (d) => (log += d));
    state.child.stderr!.on('data', (d) => (log += d));
    const deadline = Date.now() + 60_000;
    for (;;) {
      if (state.child.exitCode !== null) throw new Error(`server exited early:\n${log}`);
      try {
        const res = await fetch(`${url}/api/health`);
        if (res.ok) return;
      } catch {
        // not listening yet
      }
      if (Date.now() > deadline) throw new Error(`server did not answer within 60 s:\n${log}`);
      await new Promise((r) => setTimeout(r, 200));
    }
  };
  await launch();

  const stop = async (signal: NodeJS.Signals = 'SIGTERM') => {
    const child = state.child;
    if (child.exitCode !== null) return;
    await new Promise<void>((resolve) => {
      child.once('exit', () => resolve());
      child.kill(signal);
    });
  };
  const close = async () => {
    await stop();
    if (tmpDir) fs.rmSync(tmpDir, { recursive: true, force: true });
  };
  return {
    url,
    dbFile,
    get child() {
      return state.child;
    },
    stop,
    restart: launch,
    close,
  };
}

/** Signs in and answers the session cookie. */
export async function signIn(url: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${url}/api/session`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status}`);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}
