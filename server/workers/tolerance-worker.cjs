// Entry of the tolerance pool's threads. The server runs TypeScript through tsx; a worker
// thread started from jest or from plain Node has no loader, so it registers tsx's require
// hook itself (harmless when the thread already inherited it) and loads the TypeScript task.
require('tsx/cjs');
module.exports = require('./tolerance-worker.ts');
