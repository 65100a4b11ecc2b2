import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '..');
const INPUTS = ['app', 'src', 'assets', 'app.json', 'babel.config.js', 'package-lock.json'];
const STAMP = '.junctura-build';

function newestMtime(p: string): number {
  if (!fs.existsSync(p)) return 0;
  const stat = fs.statSync(p);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of fs.readdirSync(p)) newest = Math.max(newest, newestMtime(path.join(p, entry)));
  return newest;
}

/** True when the export is missing or any client source is newer than the last export. */
export function webBuildIsStale(outDir: string): boolean {
  const stamp = path.join(outDir, STAMP);
  if (!fs.existsSync(stamp) || !fs.existsSync(path.join(outDir, 'index.html'))) return true;
  const builtAt = fs.statSync(stamp).mtimeMs;
  return INPUTS.some((p) => newestMtime(path.join(ROOT, p)) > builtAt);
}

/** Exports the web app with Expo when it is missing or stale. */
export function ensureWebBuild(outDir: string): void {
  if (!webBuildIsStale(outDir)) {
    console.log(`Web app in ${path.relative(ROOT, outDir) || outDir} is up to date.`);
    return;
  }
  console.log('Building the web app (about a minute on a cold cache)…');
  const startedAt = new Date();
  const result = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', outDir], {
    cwd: ROOT,
    stdio: 'inherit',
    env: { ...process.env, CI: '1', EXPO_NO_TELEMETRY: '1' },
  });
  if (result.status !== 0) throw new Error(`expo export failed with exit code ${result.status}`);
  const stamp = path.join(outDir, STAMP);
  fs.writeFileSync(stamp, `${startedAt.toISOString()}\n`);
  // Stamp with the start time so edits made during the build still count as newer.
  fs.utimesSync(stamp, startedAt, startedAt);
}
