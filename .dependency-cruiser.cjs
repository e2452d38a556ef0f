// The direction of imports in src/ (DEVELOPERS.md "Layers"). `npm run check:imports` runs it; CI
// fails on any error. tests/layers/import-rules.test.ts proves each rule still catches a
// forbidden import, so a broken pattern here cannot pass silently.
//
// src/lib is split by folder, so the folder says whether a module may reach the browser:
//   the engine  lib/allowance/ (hem and cuff) and lib/pricing/ (prices): pure arithmetic;
//   lib/shared/ anything an island may load: schemas, roles, request and response shapes, formatting;
//   lib/server/ adapters that need the server: auth + the database, mail, SMS, payments, storage,
//               PDF rendering, endpoint plumbing, per-process state.
// tests/layers/lib-folders.test.ts fails on a file of src/lib outside those four folders.
//
// Type-only imports (`import type`) are erased before anything runs, but they still tie a screen to
// a server module's shapes (Date fields that arrive as strings): every rule counts them, except that
// a shared module may read a row type from db/ (e.g. lib/shared/counter-views.ts, read through AsJson).

/** The engine: pure arithmetic that runs anywhere, the browser included. */
const ENGINE = '^src/lib/(allowance|pricing)/';
/** Code that may reach the browser. */
const SHARED = '^src/lib/shared/';
/** Server adapters: secrets, the database, the disk, Node's APIs, server SDKs. */
const SERVER_LIB = '^src/lib/server/';
/** What only the server may import: the server adapters and Astro's server settings. */
const SERVER_ONLY = [SERVER_LIB, '^astro:env/server$'];
/** Everything above src/lib and src/db that serves a request. */
const UPPER = ['^src/services/', '^src/pages/', '^src/components/', '^src/layouts/', '^src/middleware\\.ts$'];

/** An npm package the app depends on at run time (a devDependency would be missing in production;
 * npm-no-pkg is a package found without a package.json listing it, as in the test's fixture). */
const NPM_PACKAGE = ['npm', 'npm-no-pkg'];

module.exports = {
  forbidden: [
    {
      name: 'engine-is-pure',
      comment:
        'The hem-and-cuff engine imports only its own files and npm packages: no app code, no Astro ' +
        '(astro:*), no Node built-ins, so it runs anywhere, the browser included.',
      severity: 'error',
      from: { path: '^src/lib/allowance/' },
      to: { pathNot: '^src/lib/allowance/', dependencyTypesNot: NPM_PACKAGE },
    },
    {
      name: 'pricing-is-pure',
      comment:
        'The fitting vocabulary (shared/fitting/kinds.ts, plain data importing nothing) is allowed. ' +
        'Price computation imports only its own files, the engine and npm packages: no app code, no Astro, no Node built-ins.',
      severity: 'error',
      from: { path: '^src/lib/pricing/' },
      to: { pathNot: ['^src/lib/pricing/', '^src/lib/allowance/', '^src/lib/shared/fitting/kinds\\.ts$'], dependencyTypesNot: NPM_PACKAGE },
    },
    {
      name: 'fitting-vocabulary-imports-nothing',
      comment: 'The fitting vocabulary is plain data that the engine-side pricing reads: it imports nothing.',
      severity: 'error',
      from: { path: '^src/lib/shared/fitting/kinds\\.ts$' },
      to: {},
    },
    {
      name: 'engine-no-builtins',
      comment: 'The engine (allowance, pricing) runs in the browser too: no node:fs, node:crypto, ...',
      severity: 'error',
      from: { path: ENGINE },
      to: { dependencyTypes: ['core'] },
    },
    {
      name: 'shared-not-server',
      comment:
        'lib/shared/ may reach the browser: it imports no server adapter (lib/server/), no astro:env/server ' +
        'and no database module (a row type from db/ is allowed: erased, and read as AsJson). A module ' +
        'that needs the server goes in lib/server/.',
      severity: 'error',
      from: { path: SHARED },
      to: { path: SERVER_ONLY },
    },
    {
      name: 'shared-no-db',
      comment: 'lib/shared/ may reach the browser: no database module at run time (row types only).',
      severity: 'error',
      from: { path: SHARED },
      to: { path: '^src/db/', dependencyTypesNot: ['type-only'] },
    },
    {
      name: 'shared-no-builtins',
      comment: 'lib/shared/ may reach the browser: no Node built-ins.',
      severity: 'error',
      from: { path: SHARED },
      to: { dependencyTypes: ['core'] },
    },
    {
      name: 'lib-not-upward',
      comment:
        'src/lib is below everything that serves a request: it never imports services, pages, layouts, ' +
        'components or the middleware (a lib module that needs a service belongs in services/).',
      severity: 'error',
      from: { path: '^src/lib/' },
      to: { path: UPPER },
    },
    {
      name: 'db-not-upward',
      comment:
        'The database module and its tables sit below the server adapters (lib/server/ imports db/): they ' +
        'import only lib/shared/, the engine and packages; no server adapter, service, page, component or middleware.',
      severity: 'error',
      from: { path: '^src/db/' },
      to: { path: [SERVER_LIB, ...UPPER] },
    },
    {
      name: 'services-not-upward',
      comment: 'Services do the work behind endpoints and pages: they never import a page, a screen or the middleware.',
      severity: 'error',
      from: { path: '^src/services/' },
      to: { path: ['^src/components/', '^src/layouts/', '^src/middleware\\.ts$'] },
    },
    {
      name: 'nothing-imports-pages',
      comment:
        'Pages and endpoints are the top: nothing outside pages/ imports one (code they share goes in src/lib ' +
        'or services/; a page may use a `_helper.ts` beside it, which Astro serves as no route).',
      severity: 'error',
      from: { path: '^src/', pathNot: '^src/pages/' },
      to: { path: '^src/pages/' },
    },
    {
      name: 'islands-no-db',
      comment: 'Islands reach the browser: no database module or table, not even its types (a shape they read ' + 'comes from lib/shared/, dates as strings).',
      severity: 'error',
      from: { path: '^src/components/' },
      to: { path: '^src/db/' },
    },
    {
      name: 'islands-no-services',
      comment:
        'Islands reach the browser: no service, not even its types (they call the API through fetch; ' +
        'response shapes live in lib/shared/, e.g. counter-views.ts, dates as strings).',
      severity: 'error',
      from: { path: '^src/components/' },
      to: { path: '^src/services/' },
    },
    {
      name: 'islands-no-server-lib',
      comment:
        'Islands reach the browser: no server adapter (lib/server/), not even its types, and no ' +
        'astro:env/server (a shape an island needs lives in lib/shared/, e.g. cut-sheet-types.ts).',
      severity: 'error',
      from: { path: '^src/components/' },
      to: { path: SERVER_ONLY },
    },
    {
      name: 'islands-no-builtins',
      comment: 'Islands reach the browser: no Node built-ins.',
      severity: 'error',
      from: { path: '^src/components/' },
      to: { dependencyTypes: ['core'], dependencyTypesNot: ['type-only'] },
    },
    {
      name: 'no-unresolvable',
      comment:
        "Every import in src/ names a file or package that exists (astro:* modules are Astro's own): a path " +
        'left behind by a move fails here, before TypeScript or the build.',
      severity: 'error',
      from: { path: '^src/' },
      to: { couldNotResolve: true, pathNot: '^astro:' },
    },
    {
      name: 'no-circular',
      comment: 'No import cycles anywhere in src/ (a cycle makes load order decide what is undefined).',
      severity: 'error',
      from: { path: '^src/' },
      to: { circular: true },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    exclude: { path: '\\.astro/' },
    // Parse TypeScript with the compiler before compilation, so `import type` is seen and labelled
    // 'type-only' (the db row-type exception for lib/shared/ lets those through).
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.json' },
    enhancedResolveOptions: {
      exportsFields: ['exports'],
      conditionNames: ['import', 'require', 'node', 'default', 'types'],
      extensions: ['.ts', '.tsx', '.js', '.mjs', '.cjs', '.jsx', '.d.ts', '.json'],
    },
    moduleSystems: ['es6', 'cjs'],
  },
};
