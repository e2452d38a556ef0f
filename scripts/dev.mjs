// npm run dev: Astro's dev server (started directly: killing `npx astro dev` leaves astro running).
import { spawn } from 'node:child_process';

const dev = spawn('node_modules/.bin/astro', ['dev', ...process.argv.slice(2)], { stdio: 'inherit' });
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => dev.kill(sig));
dev.on('exit', (code) => process.exit(code ?? 0));
