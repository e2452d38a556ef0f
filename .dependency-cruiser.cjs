// The direction of imports in src/ (DEVELOPERS.md "Layers"). `npm run check:imports` runs it; CI
// fails on any error. tests/layers/import-rules.test.ts proves each rule still catches a
// forbidden import, so a broken pattern here cannot pass silently.
//
// Type-only imports (`import type`) are erased before anything runs, but they still tie a screen to
// a server module's shapes (Date fields that arrive as strings): every rule counts them, except
// that an island may read a type from a server-only lib module (SERVER_ONLY_LIB), and a shared lib
// module a type from db/ or a server-only module (e.g. lib/counter-views.ts reads row types).

/** Server-only modules of src/lib: they read secrets, the database, the disk or Node's APIs and
 * must never be bundled into an island. A new server adapter in src/lib goes on this list. */
const SERVER_ONLY_LIB = [
  '^src/lib/(auth|auth-hooks|auth-plugins|auth-secret)\\.ts$', // better-auth + the database + the secret
  '^src/lib/(mail|sent-mail-record)\\.ts$', // nodemailer, SMTP settings, the sent-mail table
  '^src/lib/payment-service\\.ts$', // the payment service's secret key
  '^src/lib/(sms|sms-service)\\.ts$', // the SMS service's token and its SDK
  '^src/lib/render-pdf\\.ts$', // react-pdf + pdfkit
  '^src/lib/(cut-sheet|claim-slip|receipt|pdf-platform|storage)/', // PDF drawing, fonts, files on disk
  '^src/lib/(api|body|client-address|deployment|security-headers|route|openapi)\\.ts$', // endpoint plumbing
  '^src/lib/member-activity\\.ts$', // requests in flight, per process
  '^src/lib/request-log\\.ts$', // pino, REQUEST_LOG
];

/** What only the server may import: those modules and Astro's server settings. */
const SERVER_ONLY = [...SERVER_ONLY_LIB, '^astro:env/server$'];

/** An npm package the app depends on at run time (a devDependency would be missing in production;
 * npm-no-pkg is a package found without a package.json listing it, as in the test's fixture). */
const NPM_PACKAGE = ['npm', 'npm-no-pkg'];

/** The type-only exception for islands: a plain shape an island only reads (e.g. PageSize). */
const TYPES_ONLY = { dependencyTypesNot: ['type-only'] };

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
      name: 'engine-no-builtins',
      comment: 'The engine runs in the browser too: no node:fs, node:crypto, ...',
      severity: 'error',
      from: { path: '^src/lib/allowance/' },
      to: { dependencyTypes: ['core'] },
    },
    {
      name: 'pricing-is-pure',
      comment:
        'Price computation imports only its own files, the engine, the fitting vocabulary (kinds.ts, which imports nothing) ' +
        'and npm packages: no app code, no Astro, no Node built-ins.',
      severity: 'error',
      from: { path: '^src/lib/pricing/' },
      to: { pathNot: ['^src/lib/pricing/', '^src/lib/allowance/', '^src/lib/fitting/kinds\\.ts$'], dependencyTypesNot: NPM_PACKAGE },
    },
    {
      name: 'fitting-vocabulary-imports-nothing',
      comment: 'The fitting vocabulary is plain data that the engine-side pricing reads: it imports nothing.',
      severity: 'error',
      from: { path: '^src/lib/fitting/kinds\\.ts$' },
      to: {},
    },
    {
      name: 'pricing-no-builtins',
      comment: 'Prices are computed in islands too: no Node built-ins.',
      severity: 'error',
      from: { path: '^src/lib/pricing/' },
      to: { dependencyTypes: ['core'] },
    },
    {
      name: 'lib-not-upward',
      comment:
        'src/lib is below everything that serves a request: it never imports services, pages, ' +
        'components or the middleware (a lib module that needs a service belongs in services/).',
      severity: 'error',
      from: { path: '^src/lib/' },
      to: { path: ['^src/services/', '^src/pages/', '^src/components/', '^src/middleware\\.ts$'] },
    },
    {
      name: 'shared-lib-not-server',
      comment:
        'A src/lib module not on SERVER_ONLY_LIB may reach the browser: at run time it imports no ' +
        'database module, no server-only lib module and no astro:env/server (types are erased, so ' +
        'they may come along). A lib module that needs them goes on SERVER_ONLY_LIB.',
      severity: 'error',
      from: { path: '^src/lib/', pathNot: SERVER_ONLY_LIB },
      to: { path: ['^src/db/', ...SERVER_ONLY], dependencyTypesNot: ['type-only'] },
    },
    {
      name: 'shared-lib-no-builtins',
      comment: 'A src/lib module not on SERVER_ONLY_LIB may reach the browser: no Node built-ins.',
      severity: 'error',
      from: { path: '^src/lib/', pathNot: SERVER_ONLY_LIB },
      to: { dependencyTypes: ['core'], dependencyTypesNot: ['type-only'] },
    },
    {
      name: 'db-not-upward',
      comment: 'The database module and its tables import no services, pages, components or middleware.',
      severity: 'error',
      from: { path: '^src/db/' },
      to: { path: ['^src/services/', '^src/pages/', '^src/components/', '^src/middleware\\.ts$'] },
    },
    {
      name: 'services-not-upward',
      comment: 'Services do the work behind endpoints and pages: they never import a page, a screen or the middleware.',
      severity: 'error',
      from: { path: '^src/services/' },
      to: { path: ['^src/pages/', '^src/components/', '^src/middleware\\.ts$'] },
    },
    {
      name: 'islands-no-db',
      comment: 'Islands reach the browser: no database module or table (a shape they read comes from a ' + 'shared schema in src/lib, dates as strings).',
      severity: 'error',
      from: { path: '^src/components/' },
      to: { path: '^src/db/' },
    },
    {
      name: 'islands-no-services',
      comment:
        'Islands reach the browser: no service, not even its types (they call the API through fetch; ' +
        'response shapes live in src/lib, e.g. counter-views.ts, dates as strings).',
      severity: 'error',
      from: { path: '^src/components/' },
      to: { path: '^src/services/' },
    },
    {
      name: 'islands-no-server-lib',
      comment: 'Islands reach the browser: no server-only module of src/lib (SERVER_ONLY_LIB above).',
      severity: 'error',
      from: { path: '^src/components/' },
      to: { path: SERVER_ONLY, ...TYPES_ONLY },
    },
    {
      name: 'islands-no-builtins',
      comment: 'Islands reach the browser: no Node built-ins.',
      severity: 'error',
      from: { path: '^src/components/' },
      to: { dependencyTypes: ['core'], ...TYPES_ONLY },
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
    // 'type-only' (the island rules let those through).
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
