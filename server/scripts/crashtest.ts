import sqlite3 from 'sqlite3';
import { DEMO_PASSWORD } from '../seed/demo';
import { signIn, startTestServer } from './test-server';

/**
 * `npm run crashtest [-- --short]`: writes comments and saves from many concurrent clients,
 * kills the server with SIGKILL in the middle, restarts it on the same SQLite file, and checks
 * that the file passes `PRAGMA integrity_check` and that every acknowledged write is there.
 */
async function integrityCheck(file: string): Promise<string> {
  const db = new sqlite3.Database(file, sqlite3.OPEN_READONLY);
  try {
    return await new Promise((resolve, reject) => db.get('PRAGMA integrity_check', (err, row: { integrity_check: string }) => (err ? reject(err) : resolve(row.integrity_check))));
  } finally {
    db.close();
  }
}

async function main() {
  const short = process.argv.includes('--short');
  const writers = short ? 8 : 32;
  const killAfterMs = short ? 1500 : 8000;
  const rounds = short ? 1 : 3;

  const server = await startTestServer();
  let failed = false;
  try {
    for (let round = 1; round <= rounds; round++) {
      const cookie = await signIn(server.url, 'designer@example.com', DEMO_PASSWORD);
      const headers = { cookie, 'content-type': 'application/json' };
      const studies = ((await (await fetch(`${server.url}/api/studies`, { headers })).json()) as { studies: { id: number }[] }).studies;
      const acked = new Map<number, Set<number>>();
      const ackedVersions = new Map<number, number>();
      let attempts = 0;
      let stop = false;

      const writer = async (w: number) => {
        const study = studies[w % studies.length].id;
        while (!stop) {
          attempts++;
          try {
            const res = await fetch(`${server.url}/api/studies/${study}/comments`, { method: 'POST', headers, body: JSON.stringify({ body: `crash round ${round} writer ${w}` }) });
            if (res.status === 201) {
              const { comment } = (await res.json()) as { comment: { id: number } };
              if (!acked.has(study)) acked.set(study, new Set());
              acked.get(study)!.add(comment.id);
            }
            const current = (await (await fetch(`${server.url}/api/studies/${study}`, { headers })).json()) as { study: { version: number } };
            const save = await fetch(`${server.url}/api/studies/${study}`, { method: 'PUT', headers, body: JSON.stringify({ baseVersion: current.study.version, description: `crash round ${round}` }) });
            if (save.status === 200) {
              const { study: saved } = (await save.json()) as { study: { version: number } };
              ackedVersions.set(study, Math.max(ackedVersions.get(study) ?? 0, saved.version));
            }
          } catch {
            return; // the server is gone
          }
        }
      };

      const running = Array.from({ length: writers }, (_, w) => writer(w));
      await new Promise((r) => setTimeout(r, killAfterMs));
      await server.stop('SIGKILL');
      stop = true;
      await Promise.all(running);

      const integrity = await integrityCheck(server.dbFile);
      await server.restart();
      const after = await signIn(server.url, 'designer@example.com', DEMO_PASSWORD);
      let missing = 0;
      let ackedCount = 0;
      for (const [study, ids] of acked) {
        const stored = new Set(
          ((await (await fetch(`${server.url}/api/studies/${study}/comments`, { headers: { cookie: after } })).json()) as { comments: { id: number }[] }).comments.map((c) => c.id),
        );
        for (const id of ids) {
          ackedCount++;
          if (!stored.has(id)) missing++;
        }
      }
      let staleVersions = 0;
      for (const [study, version] of ackedVersions) {
        const now = (await (await fetch(`${server.url}/api/studies/${study}`, { headers: { cookie: after } })).json()) as { study: { version: number } };
        if (now.study.version < version) staleVersions++;
      }
      console.log(
        `round ${round}: ${writers} writers, killed after ${killAfterMs} ms; ${attempts} write attempts, ${ackedCount} acknowledged comments, ${ackedVersions.size} studies saved; integrity_check: ${integrity}; missing comments: ${missing}; saves lost: ${staleVersions}`,
      );
      if (integrity !== 'ok' || missing > 0 || staleVersions > 0 || ackedCount === 0) failed = true;
    }
  } finally {
    await server.close();
  }
  if (failed) {
    console.error('FAILED: the database lost acknowledged writes or is damaged (or nothing was written)');
    process.exitCode = 1;
  } else console.log('Crash test passed: every acknowledged write survived SIGKILL.');
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
