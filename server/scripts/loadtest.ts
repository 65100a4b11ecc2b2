import autocannon from 'autocannon';
import { DEMO_PASSWORD } from '../seed/demo';
import { signIn, startTestServer } from './test-server';

/**
 * `npm run loadtest [-- --short] [--json]`: the real server in its own process on loopback,
 * autocannon as the client. Mixed signed-in traffic: list studies, open one, solve it, comment
 * on it, save it (saves carry the version they read; a 409 is the expected answer to a stale
 * one). Every acknowledged write is counted and read back afterwards. `--database-url=URL`
 * runs the server on that (empty) database instead of a fresh SQLite file, e.g. PostgreSQL.
 */
async function main() {
  const short = process.argv.includes('--short');
  const json = process.argv.includes('--json');
  const connections = short ? 10 : 50;
  const duration = short ? 5 : 30;

  const databaseUrl = process.argv.find((a) => a.startsWith('--database-url='))?.slice('--database-url='.length);
  const server = await startTestServer({ databaseUrl });
  try {
    const cookie = await signIn(server.url, 'designer@example.com', DEMO_PASSWORD);
    const headers = { cookie, 'content-type': 'application/json' };
    const list = (await (await fetch(`${server.url}/api/studies`, { headers })).json()) as { studies: { id: number; version: number }[] };
    const target = list.studies[0];
    const startVersion = target.version;
    const startComments = ((await (await fetch(`${server.url}/api/studies/${target.id}/comments`, { headers })).json()) as { comments: unknown[] }).comments.length;

    let ackedComments = 0;
    let ackedSaves = 0;
    let conflicts = 0;
    let serverErrors = 0;
    const countStatus = (status: number) => {
      if (status >= 500) serverErrors++;
    };

    const result = await autocannon({
      url: server.url,
      connections,
      duration,
      headers,
      requests: [
        { method: 'GET', path: '/api/studies', onResponse: countStatus },
        {
          method: 'GET',
          path: `/api/studies/${target.id}`,
          onResponse: (status, body, context) => {
            countStatus(status);
            if (status === 200) (context as Record<string, unknown>).version = (JSON.parse(body) as { study: { version: number } }).study.version;
          },
        },
        { method: 'GET', path: `/api/studies/${target.id}/result`, onResponse: countStatus },
        {
          method: 'POST',
          path: `/api/studies/${target.id}/comments`,
          body: JSON.stringify({ body: 'load test comment' }),
          onResponse: (status) => {
            countStatus(status);
            if (status === 201) ackedComments++;
          },
        },
        {
          method: 'PUT',
          path: `/api/studies/${target.id}`,
          setupRequest: (req, context) => ({ ...req, body: JSON.stringify({ baseVersion: ((context as Record<string, unknown>).version as number | undefined) ?? startVersion, description: `saved under load ${Date.now()}` }) }),
          onResponse: (status) => {
            countStatus(status);
            if (status === 200) ackedSaves++;
            if (status === 409) conflicts++;
          },
        },
      ],
    });

    const after = (await (await fetch(`${server.url}/api/studies/${target.id}`, { headers })).json()) as { study: { version: number } };
    const comments = ((await (await fetch(`${server.url}/api/studies/${target.id}/comments`, { headers })).json()) as { comments: unknown[] }).comments.length;
    const revisions = ((await (await fetch(`${server.url}/api/studies/${target.id}/revisions`, { headers })).json()) as { revisions: unknown[] }).revisions.length;
    const figures = {
      connections,
      durationS: duration,
      requests: result.requests.total,
      requestsPerSecond: Math.round(result.requests.average),
      latencyP50Ms: result.latency.p50,
      latencyP99Ms: result.latency.p99,
      non2xx: result.non2xx,
      errors: result.errors + result.timeouts,
      serverErrors,
      conflicts409: conflicts,
      ackedComments,
      ackedSaves,
      // Lost: acknowledged but not there. A write in flight when the run stops may be stored
      // without its answer being counted, so more than acknowledged is fine.
      lostComments: Math.max(0, startComments + ackedComments - comments),
      lostSaves: Math.max(0, startVersion + ackedSaves - after.study.version),
      storedComments: comments - startComments,
      storedSaves: after.study.version - startVersion,
      revisionsMatchVersion: revisions === after.study.version,
    };
    if (json) console.log(JSON.stringify(figures, null, 2));
    else {
      console.log(`Load test: ${connections} connections for ${duration} s on ${server.url}`);
      for (const [k, v] of Object.entries(figures)) console.log(`  ${k.padEnd(22)} ${v}`);
    }
    const ok = figures.serverErrors === 0 && figures.errors === 0 && figures.lostComments === 0 && figures.lostSaves === 0 && figures.revisionsMatchVersion;
    if (!ok) {
      console.error('FAILED: 5xx answers, connection errors or lost writes (see above)');
      process.exitCode = 1;
    }
  } finally {
    await server.close();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
