import { spawn } from 'node:child_process';
import path from 'node:path';
import { startPgCluster, type PgCluster } from './pg-cluster';

/**
 * `npm run test:pg [-- jest args]`: the server test project against a real PostgreSQL. With
 * TEST_DATABASE_URL=postgres://… it uses that server (each test file creates and drops its own
 * database there); otherwise it starts a throwaway local cluster and stops it afterwards. It
 * fails, never skips, when PostgreSQL cannot be started.
 */
async function main() {
  const given = process.env.TEST_DATABASE_URL;
  if (given && !/^postgres(ql)?:\/\//.test(given)) throw new Error(`TEST_DATABASE_URL must start with postgres:// (got "${given}")`);
  let cluster: PgCluster | undefined;
  const started = Date.now();
  if (!given) {
    cluster = await startPgCluster();
    console.log(`PostgreSQL test cluster on ${cluster.url} (${Date.now() - started} ms to start)`);
  }
  const stop = () => cluster?.stop();
  process.once('exit', stop);
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.once(signal, () => {
      stop();
      process.exit(130);
    });
  }
  const root = path.resolve(__dirname, '..', '..');
  const jest = path.join(root, 'node_modules', 'jest', 'bin', 'jest.js');
  const child = spawn(process.execPath, [jest, '--selectProjects', 'server', '--no-watchman', ...process.argv.slice(2)], {
    cwd: root,
    env: { ...process.env, TEST_DATABASE_URL: given ?? cluster!.url },
    stdio: 'inherit',
  });
  const code = await new Promise<number>((resolve) => child.once('exit', (c, signal) => resolve(c ?? (signal ? 1 : 0))));
  stop();
  process.exit(code);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
