// npm start: build if needed, then serve the built app on http://localhost:4321.
import { spawn } from 'node:child_process';
import { buildIfNeeded } from './build-if-needed.mjs';

buildIfNeeded('dist');
const port = process.env.PORT || '4321';
const env = {
  ...process.env,
  PORT: port,
  HOST: process.env.HOST || '127.0.0.1',
};
console.log(`Cuffwright on http://localhost:${port}`);
const server = spawn('node', ['dist/server/entry.mjs'], { stdio: 'inherit', env });
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => server.kill(sig));
server.on('exit', (code) => process.exit(code ?? 0));
