import { PGlite } from '@electric-sql/pglite';
import { startShipped } from '/work/wt/queue/benchmarks/lib/shipped-server.mjs';
const dir = '/tmp/cuffwright-queue-bench-mFsSsj';
const pg = new PGlite(dir + '/pglite');
const { rows } = await pg.query(`select email from "user" where email like 'lead-1%@bench.test' order by email`);
await pg.close();
const emails = rows.map((r) => r.email);
console.log(emails);
const s = await startShipped({ dataDir: dir });
try {
  for (const email of emails) {
    const r = await fetch(`${s.base}/api/auth/sign-in/email`, { method: 'POST', headers: { 'content-type': 'application/json', origin: s.base }, body: JSON.stringify({ email, password: 'a-long-bench-password' }) });
    const cookie = r.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    for (const [label, path, extra] of [['open', '/api/garments', {}], ['me', '/api/me', {}], ['history', '/api/garments?view=history', {}]]) {
      const ms = [];
      let bytes = 0, etag;
      for (let i = 0; i < 30; i++) {
        const t0 = performance.now();
        const res = await fetch(s.base + path, { headers: { cookie, ...extra } });
        bytes = (await res.arrayBuffer()).byteLength; etag = res.headers.get('etag');
        ms.push(performance.now() - t0);
      }
      ms.sort((a, b) => a - b);
      console.log(email, label, 'median', ms[15].toFixed(1), 'min', ms[0].toFixed(1), 'bytes', bytes);
      if (label === 'open') {
        const m2 = [];
        for (let i = 0; i < 30; i++) { const t0 = performance.now(); const res = await fetch(s.base + path, { headers: { cookie, 'if-none-match': etag } }); await res.arrayBuffer(); m2.push(performance.now() - t0); }
        m2.sort((a, b) => a - b);
        console.log(email, '304 median', m2[15].toFixed(1), 'min', m2[0].toFixed(1));
      }
    }
  }
} finally { await s.stop(); }
