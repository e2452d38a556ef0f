// The import rules bite: dependency-cruiser runs with the project's own .dependency-cruiser.cjs over
// a tiny src/ written to a temporary folder, one forbidden import per rule plus allowed ones (the
// engine's own files, pricing on the engine, shared on the engine, server on shared and the db, a
// shared module's row type from db/, a page's own _helper), and must report exactly the forbidden ones. A pattern broken in the config, or a rule
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
    "import { roles } from '@/lib/shared/roles';", // engine-is-pure
    "import { money } from '../pricing/money';", // engine-is-pure: the hem engine stands alone, below pricing
    "import { readFileSync } from 'node:fs';", // engine-is-pure, engine-no-builtins
    "import { SMTP_HOST } from 'astro:env/server';", // engine-is-pure (Astro, unresolved)
    'export const plan = [len, roles, money, readFileSync, SMTP_HOST];',
  ].join('\n'),
  'src/lib/pricing/money.ts': 'export const money = 1;\n',
  'src/lib/pricing/price.ts': [
    "import { len } from '../allowance/len';", // allowed: pricing on the engine
    "import { money } from './money';", // allowed: its own file
    "import { kinds } from '../shared/fitting/kinds';", // allowed: the fitting vocabulary
    "import { roles } from '../shared/roles';", // pricing-is-pure
    "import { randomUUID } from 'node:crypto';", // pricing-is-pure, engine-no-builtins
    'export const price = [len, money, kinds, roles, randomUUID];',
  ].join('\n'),
  'src/lib/shared/fitting/kinds.ts': "import { roles } from '../roles';\nexport const kinds = roles;\n", // fitting-vocabulary-imports-nothing
  'src/lib/shared/roles.ts': "import { len } from '@/lib/allowance/len';\nexport const roles = len;\n", // allowed: shared on the engine
  'src/lib/shared/helper.ts': [
    "import { thing } from '@/services/thing';", // lib-not-upward
    "import { onRequest } from '../../middleware';", // lib-not-upward
    "import { Frame } from '@/layouts/frame';", // lib-not-upward
    'export const helper = [thing, onRequest, Frame];',
  ].join('\n'),
  'src/lib/shared/views.ts': [
    "import { db } from '@/db';", // shared-no-db
    "import { mail } from '../server/mail';", // shared-not-server
    "import type { Session } from '@/lib/server/auth';", // shared-not-server: types count too
    "import type { Row } from '@/db/row';", // allowed: a row type, erased (read as AsJson)
    "import { hostname } from 'node:os';", // shared-no-builtins
    "import { SMTP_HOST } from 'astro:env/server';", // shared-not-server
    "import { roles } from './roles';", // allowed: its own layer
    'export const views = (r: Row, s: Session) => [db, mail, hostname, SMTP_HOST, roles, r, s];',
  ].join('\n'),
  'src/lib/server/mail.ts': [
    "import { db } from '@/db';", // allowed: a server adapter on the db
    "import { roles } from '../shared/roles';", // allowed: server on shared
    "import { len } from '../allowance/len';", // allowed: server on the engine
    "import { hostname } from 'node:os';", // allowed: the server has Node
    "import { page } from '@/pages/page';", // nothing-imports-pages
    'export const mail = [db, roles, len, hostname, page];',
  ].join('\n'),
  'src/lib/server/auth.ts': 'export interface Session { id: string }\n',
  'src/lib/server/cycle-a.ts': "import { b } from './cycle-b';\nexport const a = () => b;\n", // no-circular
  'src/lib/server/cycle-b.ts': "import { a } from './cycle-a';\nexport const b = () => a;\n", // no-circular
  'src/middleware.ts': "import { page } from './pages/page';\nexport const onRequest = page;\n", // nothing-imports-pages
  'src/layouts/frame.ts': "import { gone } from '../lib/shared/gone';\nexport const Frame = gone;\n", // no-unresolvable
  'src/pages/page.ts': "import { helper } from './_helper';\nexport const page = helper;\n", // allowed: a page's own _helper
  'src/pages/_helper.ts': 'export const helper = 1;\n',
  'src/services/thing.ts': [
    "import type { Session } from '@/lib/server/auth';", // allowed: a service on a server adapter
    "import { onRequest } from '../middleware';", // services-not-upward
    'export const thing = (s: Session) => [s, onRequest];',
  ].join('\n'),
  'src/db/index.ts': [
    "import { thing } from '../services/thing';", // db-not-upward
    "import { roles } from '../lib/shared/roles';", // allowed: a table on a shared list
    'export const db = [thing, roles];',
  ].join('\n'),
  'src/db/row.ts': [
    "import type { Session } from '../lib/server/auth';", // db-not-upward: the server adapters sit above db/
    'export interface Row { at: string; by: Session }',
  ].join('\n'),
  'src/components/Island.tsx': [
    "import { db } from '@/db';", // islands-no-db
    "import type { Row } from '@/db/row';", // islands-no-db: types count too
    "import { thing } from '@/services/thing';", // islands-no-services
    "import { mail } from '@/lib/server/mail';", // islands-no-server-lib
    "import type { Session } from '@/lib/server/auth';", // islands-no-server-lib: types count too
    "import { roles } from '@/lib/shared/roles';", // allowed: shared
    "import { price } from '@/lib/pricing/price';", // allowed: the engine
    "import { join } from 'node:path';", // islands-no-builtins
    "import { MAIL_FROM } from 'astro:env/server';", // islands-no-server-lib
    "import { page } from '../pages/page';", // nothing-imports-pages
    'export const island = (r: Row, s: Session) => [db, thing, mail, roles, price, join, MAIL_FROM, page, r, s];',
  ].join('\n'),
};

/** Every violation expected, as "rule from → to" (a built-in by its bare name; a cycle once per module in it). */
const expected = [
  'engine-is-pure src/lib/allowance/plan.ts → src/lib/shared/roles.ts',
  'engine-is-pure src/lib/allowance/plan.ts → src/lib/pricing/money.ts',
  'engine-is-pure src/lib/allowance/plan.ts → fs',
  'engine-no-builtins src/lib/allowance/plan.ts → fs',
  'engine-is-pure src/lib/allowance/plan.ts → astro:env/server',
  'pricing-is-pure src/lib/pricing/price.ts → src/lib/shared/roles.ts',
  'fitting-vocabulary-imports-nothing src/lib/shared/fitting/kinds.ts → src/lib/shared/roles.ts',
  'pricing-is-pure src/lib/pricing/price.ts → crypto',
  'engine-no-builtins src/lib/pricing/price.ts → crypto',
  'lib-not-upward src/lib/shared/helper.ts → src/services/thing.ts',
  'lib-not-upward src/lib/shared/helper.ts → src/middleware.ts',
  'lib-not-upward src/lib/shared/helper.ts → src/layouts/frame.ts',
  'shared-no-db src/lib/shared/views.ts → src/db/index.ts',
  'shared-not-server src/lib/shared/views.ts → src/lib/server/mail.ts',
  'shared-not-server src/lib/shared/views.ts → src/lib/server/auth.ts',
  'shared-no-builtins src/lib/shared/views.ts → os',
  'shared-not-server src/lib/shared/views.ts → astro:env/server',
  'nothing-imports-pages src/lib/server/mail.ts → src/pages/page.ts',
  'lib-not-upward src/lib/server/mail.ts → src/pages/page.ts',
  'nothing-imports-pages src/middleware.ts → src/pages/page.ts',
  'services-not-upward src/services/thing.ts → src/middleware.ts',
  'db-not-upward src/db/index.ts → src/services/thing.ts',
  'db-not-upward src/db/row.ts → src/lib/server/auth.ts',
  'islands-no-db src/components/Island.tsx → src/db/index.ts',
  'islands-no-db src/components/Island.tsx → src/db/row.ts',
  'islands-no-services src/components/Island.tsx → src/services/thing.ts',
  'islands-no-server-lib src/components/Island.tsx → src/lib/server/mail.ts',
  'islands-no-server-lib src/components/Island.tsx → src/lib/server/auth.ts',
  'islands-no-server-lib src/components/Island.tsx → astro:env/server',
  'islands-no-builtins src/components/Island.tsx → path',
  'nothing-imports-pages src/components/Island.tsx → src/pages/page.ts',
  'no-unresolvable src/layouts/frame.ts → ../lib/shared/gone',
  'no-circular src/lib/server/cycle-a.ts → src/lib/server/cycle-b.ts',
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
