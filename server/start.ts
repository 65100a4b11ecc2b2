import { loadConfig } from './config';
import { main } from './index';
import { ensureWebBuild } from './web-build';

// `npm start`: the web export when missing or stale, then the one server for app and API.
ensureWebBuild(loadConfig(process.env, () => {}).webDir);
main().catch((err) => {
  console.error(err);
  process.exit(1);
});
