// The import rules bite: dependency-cruiser runs with the project's own .dependency-cruiser.cjs over
// a tiny src/ written to a temporary folder, one forbidden import per rule plus allowed ones (an
// island's type-only import of a server-only lib module, the engine's own files, pricing on the
// engine), and must report exactly the forbidden ones. A pattern broken in the config, or a rule
// added without a case here, fails.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const root = resolve(import.meta.dirname, '../..');
const configPath = join(root, '.dependency-cruiser.cjs');
const cli = join(root, 'node_modules/dependency-cruiser/bin/dependency-cruise.mjs');

const files: Record<string, string> = {
  'tsconfig.json': JSON.stringify({
    compilerOptions: { baseUrl: '.', paths: { '@/*': ['src/*'] }, jsx: 'react-jsx', module: 'esnext', moduleResolution: 'bundler' },
  }),
  'src/lib/allowance/len.ts': 'export const len = 1;\n',
  'src/lib/allowance/plan.ts': [
    "import { len } from './len';", // allowed: its own file
    "import { roles } from '@/lib/roles';", // engine-is-pure
    "import { readFileSync } from 'node:fs';", // engine-is-pure, engine-no-builtins
    "import { SMTP_HOST } from 'astro:env/server';", // engine-is-pure (Astro, unresolved)
    'export const plan = [len, roles, readFileSync, SMTP_HOST];',
  ].join('\n'),
  'src/lib/roles.ts': 'export const roles = 1;\n',
  'src/lib/pricing/price.ts': [
    "import { len } from '../allowance/len';", // allowed: pricing on the engine
    "import { roles } from '../roles';", // pricing-is-pure
    "import { randomUUID } from 'node:crypto';", // pricing-is-pure, pricing-no-builtins
    'export const price = [len, roles, randomUUID];',
  ].join('\n'),
  'src/lib/helper.ts': [
    "import { thing } from '@/services/thing';", // lib-not-upward
    "import { onRequest } from '../middleware';", // lib-not-upward
    'export const helper = [thing, onRequest];',
  ].join('\n'),
  'src/lib/shared.ts': [
    "import { db } from '@/db';", // shared-lib-not-server
    "import { mail } from './mail';", // shared-lib-not-server
    "import type { Row } from '@/db/row';", // allowed: types are erased
    "import { hostname } from 'node:os';", // shared-lib-no-builtins
    "import { SMTP_HOST } from 'astro:env/server';", // shared-lib-not-server
    'export const shared = (r: Row) => [db, mail, hostname, SMTP_HOST, r];',
  ].join('\n'),
  'src/lib/mail.ts': "import { db } from '@/db';\nexport const mail = db;\n", // allowed: a server adapter on the db
  'src/lib/auth.ts': 'export interface Session { id: string }\n',
  'src/lib/cycle-a.ts': "import { b } from './cycle-b';\nexport const a = () => b;\n", // no-circular
  'src/lib/cycle-b.ts': "import { a } from './cycle-a';\nexport const b = () => a;\n", // no-circular
  'src/middleware.ts': 'export const onRequest = 1;\n',
  'src/pages/page.ts': 'export const page = 1;\n',
  'src/services/thing.ts': "import { page } from '../pages/page';\nexport const thing = page;\n", // services-not-upward
  'src/db/index.ts': "import { thing } from '../services/thing';\nexport const db = thing;\n", // db-not-upward
  'src/db/row.ts': 'export interface Row { at: string }\n',
  'src/components/Island.tsx': [
    "import { db } from '@/db';", // islands-no-db
    "import type { Row } from '@/db/row';", // islands-no-db: types count too
    "import { thing } from '@/services/thing';", // islands-no-services
    "import { mail } from '@/lib/mail';", // islands-no-server-lib
    "import type { Session } from '@/lib/auth';", // allowed: a type from a server-only lib module
    "import { join } from 'node:path';", // islands-no-builtins
    "import { MAIL_FROM } from 'astro:env/server';", // islands-no-server-lib
    'export const island = (r: Row, s: Session) => [db, thing, mail, join, MAIL_FROM, r, s];',
  ].join('\n'),
};

/** Every violation expected, as "rule from → to" (a built-in by its bare name; a cycle once, at its first module). */
const expected = [
  'engine-is-pure src/lib/allowance/plan.ts → src/lib/roles.ts',
  'engine-is-pure src/lib/allowance/plan.ts → fs',
  'engine-no-builtins src/lib/allowance/plan.ts → fs',
  'engine-is-pure src/lib/allowance/plan.ts → astro:env/server',
  'pricing-is-pure src/lib/pricing/price.ts → src/lib/roles.ts',
  'pricing-is-pure src/lib/pricing/price.ts → crypto',
  'pricing-no-builtins src/lib/pricing/price.ts → crypto',
  'lib-not-upward src/lib/helper.ts → src/services/thing.ts',
  'shared-lib-not-server src/lib/shared.ts → src/db/index.ts',
  'shared-lib-not-server src/lib/shared.ts → src/lib/mail.ts',
  'shared-lib-no-builtins src/lib/shared.ts → os',
  'shared-lib-not-server src/lib/shared.ts → astro:env/server',
  'shared-lib-not-server src/lib/allowance/plan.ts → astro:env/server',
  'shared-lib-no-builtins src/lib/allowance/plan.ts → fs',
  'shared-lib-no-builtins src/lib/pricing/price.ts → crypto',
  'lib-not-upward src/lib/helper.ts → src/middleware.ts',
  'services-not-upward src/services/thing.ts → src/pages/page.ts',
  'db-not-upward src/db/index.ts → src/services/thing.ts',
  'islands-no-db src/components/Island.tsx → src/db/index.ts',
  'islands-no-db src/components/Island.tsx → src/db/row.ts',
  'islands-no-services src/components/Island.tsx → src/services/thing.ts',
  'islands-no-server-lib src/components/Island.tsx → src/lib/mail.ts',
  'islands-no-server-lib src/components/Island.tsx → astro:env/server',
  'islands-no-builtins src/components/Island.tsx → path',
  'no-circular src/lib/cycle-a.ts → src/lib/cycle-b.ts',
].sort();

interface Violation {
  from: string;
  to: string;
  rule: { name: string };
}

let dir = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'import-rules-'));
  for (const [path, text] of Object.entries(files)) {
    mkdirSync(dirname(join(dir, path)), { recursive: true });
    writeFileSync(join(dir, path), text);
  }
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Runs the CLI in the fixture folder: as `npm run check:imports` does, or with JSON output. */
function cruise(outputType: 'err' | 'json') {
  return spawnSync(process.execPath, [cli, 'src', '--config', configPath, '--output-type', outputType], { cwd: dir, encoding: 'utf8' });
}

describe('the import rules (.dependency-cruiser.cjs)', () => {
  it('report every forbidden import in the fixture and nothing it allows', { timeout: 120_000 }, () => {
    const run = cruise('json');
    const violations = (JSON.parse(run.stdout || 'null') as { summary: { violations: Violation[] } } | null)?.summary.violations;
    expect(violations, run.stderr).toBeDefined();
    const found = (violations ?? []).map((v) => `${v.rule.name} ${v.from} → ${v.to}`).sort();
    expect(found).toEqual(expected);
  });

  it('fail the command CI runs (exit status = the number of errors)', { timeout: 120_000 }, () => {
    const run = cruise('err');
    expect(run.stdout).toContain(`${expected.length} dependency violations (${expected.length} errors`);
    expect(run.status).toBe(expected.length);
  });

  it('every rule in the config has a case here', () => {
    const config = createRequire(import.meta.url)(configPath) as { forbidden: { name: string }[] };
    const covered = new Set(expected.map((line) => line.split(' ')[0]));
    expect(config.forbidden.map((r) => r.name).filter((name) => !covered.has(name))).toEqual([]);
  });
});
