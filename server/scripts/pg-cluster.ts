import { execFileSync, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { freePort } from './test-server';

/**
 * A throwaway PostgreSQL cluster for tests: initdb and pg_ctl in a temporary folder, listening
 * on 127.0.0.1 and a free port only, with durability switched off (nothing in it outlives the
 * run). initdb refuses to run as root, so as root the cluster runs as the `postgres` user that
 * Debian's postgresql package creates.
 */
export type PgCluster = { url: string; dir: string; stop: () => void };

const BIN_DIRS = ['/usr/local/bin', '/usr/lib/postgresql'];

/** The folder holding initdb, pg_ctl and postgres: PG_BIN, then PATH, then Debian's versioned folders (newest first). */
export function findPgBin(env: NodeJS.ProcessEnv = process.env): string | undefined {
  const has = (dir: string) => ['initdb', 'pg_ctl', 'postgres'].every((b) => fs.existsSync(path.join(dir, b)));
  if (env.PG_BIN) return has(env.PG_BIN) ? env.PG_BIN : undefined;
  for (const dir of (env.PATH ?? '').split(path.delimiter).filter(Boolean)) if (has(dir)) return dir;
  if (has(BIN_DIRS[0])) return BIN_DIRS[0];
  const versions = fs.existsSync(BIN_DIRS[1]) ? fs.readdirSync(BIN_DIRS[1]).filter((v) => /^\d+$/.test(v)).sort((a, b) => Number(b) - Number(a)) : [];
  return versions.map((v) => path.join(BIN_DIRS[1], v, 'bin')).find(has);
}

function userIds(name: string): { uid: number; gid: number } | undefined {
  const r = spawnSync('id', ['-u', name], { encoding: 'utf8' });
  if (r.status !== 0) return undefined;
  const g = spawnSync('id', ['-g', name], { encoding: 'utf8' });
  return { uid: Number(r.stdout.trim()), gid: Number(g.stdout.trim()) };
}

export async function startPgCluster(): Promise<PgCluster> {
  const bin = findPgBin();
  if (!bin) {
    throw new Error(
      'PostgreSQL is not installed (no initdb, pg_ctl and postgres on PATH, in /usr/local/bin or /usr/lib/postgresql/*/bin). ' +
        'Install it (Debian: apt-get install -y postgresql), set PG_BIN to its bin folder, or set TEST_DATABASE_URL=postgres://… to a server to use.',
    );
  }
  const asRoot = process.getuid?.() === 0;
  // The postgres user must reach the folder: /tmp is open to all, a root TMPDIR may not be.
  const dir = fs.mkdtempSync(path.join(asRoot ? '/tmp' : os.tmpdir(), 'junctura-pg-'));
  const owner = asRoot ? userIds('postgres') : undefined;
  if (asRoot && !owner) {
    fs.rmSync(dir, { recursive: true, force: true });
    throw new Error('initdb cannot run as root and there is no "postgres" user to run it as: create one (useradd -r postgres) or set TEST_DATABASE_URL');
  }
  if (owner) fs.chownSync(dir, owner.uid, owner.gid);
  const run = (cmd: string, args: string[]) => {
    const [file, argv] = owner ? ['runuser', ['-u', 'postgres', '--', path.join(bin, cmd), ...args]] : [path.join(bin, cmd), args];
    return execFileSync(file, argv, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
  };
  const data = path.join(dir, 'data');
  const log = path.join(dir, 'server.log');
  const port = await freePort();
  let stopped = false;
  const stop = () => {
    if (stopped) return;
    stopped = true;
    try {
      run('pg_ctl', ['-D', data, '-m', 'immediate', '-w', 'stop']);
    } catch {
      // not running (start failed or already stopped)
    }
    fs.rmSync(dir, { recursive: true, force: true });
  };
  try {
    run('initdb', ['-D', data, '-U', 'postgres', '-A', 'trust', '-E', 'UTF8', '--locale=C.UTF-8', '--no-sync']);
    const settings = [
      `-p ${port}`,
      '-c listen_addresses=127.0.0.1',
      `-k ${dir}`,
      '-c fsync=off',
      '-c synchronous_commit=off',
      '-c full_page_writes=off',
      '-c max_connections=200',
    ].join(' ');
    run('pg_ctl', ['-D', data, '-l', log, '-o', settings, '-w', '-t', '60', 'start']);
  } catch (err) {
    const detail = (err as { stderr?: string }).stderr ?? String(err);
    const serverLog = fs.existsSync(log) ? fs.readFileSync(log, 'utf8') : '';
    stop();
    throw new Error(`PostgreSQL did not start:\n${detail}\n${serverLog}`);
  }
  return { url: `postgres://postgres@127.0.0.1:${port}/postgres`, dir, stop };
}
