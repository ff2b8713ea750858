// The direction imports flow in, written as rules: `npm run check:imports` (and the first step of `npm test`).
// shared -> server; shared -> src/components and src/lib -> src/features -> src/app. Each rule's comment is
// the reason printed when an import breaks it.
/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: 'domain-is-pure',
      severity: 'error',
      comment:
        'shared/domain is pure computation both sides run and the unit tests check against published sources: ' +
        'it imports only its own files (no packages, no Node, no schemas, no app code).',
      from: { path: '^shared/domain/' },
      to: { pathNot: '^shared/domain/' },
    },
    {
      name: 'shared-imports-neither-side',
      severity: 'error',
      comment:
        'shared/ is imported by the client and the server alike, so it may import neither of them (nor tests, scripts or stand-ins).',
      from: { path: '^shared/' },
      to: { path: '^(src|server|dev|tests|scripts)/' },
    },
    {
      name: 'client-primitives-import-no-feature',
      severity: 'error',
      comment:
        'src/components and src/lib are the primitives every feature builds on; importing a feature or src/app from them ' +
        'runs the arrow backwards. Move the shared piece down into components/ or lib/, or the composition up into src/app/.',
      from: { path: '^src/(components|lib)/' },
      to: { path: '^src/(features|app)/' },
    },
    {
      name: 'features-import-no-app',
      severity: 'error',
      comment:
        'src/app composes the features (router, layouts, screens); a feature importing src/app runs the arrow backwards.',
      from: { path: '^src/features/' },
      to: { path: '^src/app/' },
    },
    {
      name: 'features-meet-through-public-entry',
      severity: 'error',
      comment:
        "A feature uses another feature only through that feature's public entry, src/features/<name>/index.ts, " +
        'so its inside can change freely. Export what is needed there, or move it into src/lib or src/components.',
      from: { path: '^src/features/([^/]+)/' },
      to: { path: '^src/features/', pathNot: ['^src/features/$1/', '^src/features/[^/]+/index\\.ts$'] },
    },
    {
      name: 'client-imports-no-server',
      severity: 'error',
      comment: 'The client talks to the server over HTTP only; what both need (schemas, domain) lives in shared/.',
      from: { path: '^src/' },
      to: { path: '^(server|dev|scripts|tests)/' },
    },
    {
      name: 'client-ships-no-zod',
      severity: 'error',
      comment:
        'The client imports shared/schemas for types only (`import type`), and never zod itself, so zod stays out of the ' +
        'browser bundle; the server validates every request. Plain values both sides need belong in shared/choices.ts, ' +
        'shared/domain or shared/words.',
      from: { path: '^src/' },
      to: { path: ['^shared/schemas/', 'node_modules/zod/'], dependencyTypesNot: ['type-only'] },
    },
    {
      name: 'words-import-domain-modules',
      severity: 'error',
      comment:
        "shared/words is on every screen's first load: it imports the shared/domain module it needs (../domain/units), " +
        "not the domain's index, which would bring every domain module some screen uses into the first screen's chunk.",
      from: { path: '^shared/words/' },
      to: { path: '^shared/domain/index\\.ts$', dependencyTypesNot: ['type-only'] },
    },
    {
      name: 'server-imports-no-client',
      severity: 'error',
      comment: 'The server never imports the React client; what both need lives in shared/.',
      from: { path: '^server/' },
      to: { path: '^src/' },
    },
    {
      name: 'db-imports-no-service',
      severity: 'error',
      comment:
        'server/db is the connection, the models and the migrations: the layer services stand on. It imports no service, ' +
        'route, job, auth or demo seeder.',
      from: { path: '^server/db/' },
      to: { path: '^server/(services|routes|jobs|auth|http|demo)/' },
    },
    {
      name: 'product-server-imports-no-tooling',
      severity: 'error',
      comment:
        'Product server code ships to production, where scripts/, tests/ and the development stand-ins in dev/ do not: ' +
        'it must not import them. Move what it needs into server/ (or shared/).',
      from: { path: '^server/' },
      to: { path: '^(scripts|tests|dev)/' },
    },
    {
      name: 'demo-data-stays-out-of-the-product',
      severity: 'error',
      comment:
        'The demo households are seeded by server/setup.ts (and the tests) only; product code must not depend on demo data. ' +
        'Demo seeders live in server/demo/, outside server/db.',
      from: { path: '^server/', pathNot: ['^server/demo/', '^server/setup\\.ts$'] },
      to: { path: '^server/demo/' },
    },
    {
      name: 'no-circular',
      severity: 'error',
      comment:
        'A cycle means two modules are one idea in two files, or one of them depends on the wrong side: break it.',
      from: {},
      // A cycle through type imports alone is erased at build time and harmless.
      to: { circular: true, viaOnly: { dependencyTypesNot: ['type-only'] } },
    },
    {
      name: 'not-to-unresolvable',
      severity: 'error',
      comment: 'This import names a module that does not exist (a typo, or a file that moved).',
      from: {},
      to: { couldNotResolve: true },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    exclude: { path: '^(node_modules|dist|test-results|public)/' },
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.json' },
    enhancedResolveOptions: {
      exportsFields: ['exports'],
      conditionNames: ['import', 'require', 'node', 'default', 'types'],
      extensions: ['.ts', '.tsx', '.js', '.mjs', '.cjs', '.json', '.d.ts'],
    },
    reporterOptions: { text: { highlightFocused: true } },
  },
};
