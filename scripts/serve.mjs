// npm run serve: the production start. No mail capture and no payment fake; settings from the
// environment, checked first (one line per problem); one JSON log line per request; on SIGTERM or
// SIGINT the server stops taking connections, finishes the requests in flight (up to
// SHUTDOWN_SECONDS, default 25), then exits. Build first with `npm run build`.
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { appDir } from './env.mjs';
import { serveProblems } from './serve-settings.mjs';

const problems = serveProblems();
if (problems.length) {
  console.error(`Cuffwright will not start; fix these settings:\n${problems.map((p) => `  ${p}`).join('\n')}`);
  process.exit(1);
}
// DIST_DIR: another build folder (the tests serve theirs).
const entry = join(appDir, process.env.DIST_DIR || 'dist', 'server', 'entry.mjs');
if (!existsSync(entry)) {
  console.error('Cuffwright is not built: run `npm run build` first (or `npm start` for the local demo).');
  process.exit(1);
}
process.env.NODE_ENV = 'production';
process.env.REQUEST_LOG ??= 'json';
process.env.HOST ??= '0.0.0.0';
process.env.ASTRO_NODE_AUTOSTART = 'disabled';
delete process.env.MAIL_CAPTURE_DIR;

const { startServer } = await import(pathToFileURL(entry).href);
const { server } = startServer();
const http = server.server;
const graceSeconds = Number(process.env.SHUTDOWN_SECONDS ?? 25);
let stopping = false;
for (const sig of ['SIGTERM', 'SIGINT']) {
  process.on(sig, () => {
    if (stopping) return;
    stopping = true;
    console.log(JSON.stringify({ level: 30, time: new Date().toISOString(), msg: `${sig}: finishing requests in flight, then stopping` }));
    // Stop accepting; idle keep-alive connections close now, busy ones after their answer.
    http.close(() => process.exit(0));
    http.closeIdleConnections();
    const idle = setInterval(() => http.closeIdleConnections(), 250);
    idle.unref();
    setTimeout(() => {
      console.error(JSON.stringify({ level: 50, time: new Date().toISOString(), msg: `still busy after ${graceSeconds} s: stopping anyway` }));
      process.exit(1);
    }, graceSeconds * 1000).unref();
  });
}
