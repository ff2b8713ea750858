// `npm test`: first the code rules (lint, formatting, import direction), then the same set-up as `npm start` against
// separate test databases, then every test. Extra arguments go to vitest, e.g.
// `npm test -- --project api tests/api/auth.test.ts`; `--project code` runs the code rules alone.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { ensureChromium, ensureNginx, ensureNodeModules, log, projectDir, run } from './lib/system.mjs';
import { startCluster } from './lib/postgres.mjs';

const givenArgs = process.argv.slice(2);
const projects = givenArgs.flatMap((arg, i) =>
  arg === '--project' ? [givenArgs[i + 1]] : arg.startsWith('--project=') ? [arg.slice(10)] : [],
);
// `code` is ours, not a vitest project: take it out of what vitest is given.
const extraArgs = givenArgs.filter(
  (arg, i) =>
    arg !== '--project=code' &&
    !(arg === 'code' && givenArgs[i - 1] === '--project') &&
    !(arg === '--project' && givenArgs[i + 1] === 'code'),
);
const wantsCodeRules = projects.length === 0 || projects.includes('code');
const vitestProjects = projects.filter((name) => name !== 'code');
const wantsVitest = projects.length === 0 || vitestProjects.length > 0;
const wantsBrowser = projects.length === 0 || vitestProjects.includes('e2e');
// The scale suite: whole processes (two app processes behind nginx, `npm start` under SIGTERM).
const wantsScale = projects.length === 0 || vitestProjects.includes('scale');
// The built client is served by the browser tests' server and by nginx in the scale tests.
const wantsClient = wantsBrowser || wantsScale;

ensureNodeModules();
const codeRules = wantsCodeRules ? checkCodeRules() : { passed: 0, failed: 0 };
if (!wantsVitest) {
  process.stdout.write(`\n${codeRules.passed} passed, ${codeRules.failed} failed\n`);
  process.exit(codeRules.failed ? 1 : 0);
}
if (wantsBrowser) ensureChromium();
if (wantsScale) ensureNginx();
const { buildClient, dropDatabase, recreateDatabase, setUpSchema } = await import('./lib/database.mjs');
const { spawnObjectStore } = await import('../dev/stand-ins/object-store.mjs');

const cluster = startCluster();
// Photos go to a local S3-compatible store of this run's own, in the project's data folder.
const objectStoreDir = path.join(path.dirname(cluster.dataDir), `test-object-store-${process.pid}`);
const objectStore = await spawnObjectStore(objectStoreDir);
log(`object store (S3) at ${objectStore.endpoint}, bucket ${objectStore.env.S3_BUCKET}, objects in ${objectStoreDir}`);
// Names of this run's own, so two runs at once never share a template or a build.
const template = `larderly_test_template_${process.pid}`;
const clientDir = path.join('dist', `test-client-${process.pid}`);
let exitCode = 1;
try {
  await recreateDatabase(cluster, template);
  setUpSchema(cluster.url(template));
  if (wantsClient) {
    log('building the client');
    buildClient(clientDir);
  }

  const resultsDir = path.join(projectDir, 'test-results');
  mkdirSync(resultsDir, { recursive: true });
  const resultsFile = path.join(resultsDir, `vitest-${process.pid}.json`);
  try {
    run(
      process.execPath,
      [
        'node_modules/vitest/vitest.mjs',
        'run',
        '--reporter=default',
        '--reporter=json',
        `--outputFile.json=${resultsFile}`,
        ...extraArgs,
      ],
      {
        cwd: projectDir,
        env: {
          ...process.env,
          ...objectStore.env,
          NODE_ENV: 'test',
          LARDERLY_TEST_ADMIN_URL: cluster.url('postgres'),
          LARDERLY_TEST_TEMPLATE: template,
          LARDERLY_TEST_CLIENT_DIR: clientDir,
        },
      },
    );
    exitCode = 0;
  } catch {
    exitCode = 1;
  }
  printSummary(resultsFile);
} finally {
  await dropDatabase(cluster, template).catch(() => {});
  rmSync(path.join(projectDir, clientDir), { recursive: true, force: true });
  await objectStore.close();
  rmSync(objectStoreDir, { recursive: true, force: true });
  cluster.stop();
}
process.exit(exitCode);

/** CI reads the plain line `N passed, N failed`, not vitest's own summary. */
function printSummary(resultsFile) {
  if (!existsSync(resultsFile)) {
    process.stdout.write(`\n${codeRules.passed} passed, ${1 + codeRules.failed} failed\n`);
    exitCode = 1;
    return;
  }
  const results = JSON.parse(readFileSync(resultsFile, 'utf8'));
  rmSync(resultsFile);
  const skipped = results.numPendingTests + results.numTodoTests;
  if (results.numFailedTests > 0 || results.numFailedTestSuites > 0) exitCode = 1;
  const brokenFiles = results.testResults.filter(
    (s) => s.status === 'failed' && s.assertionResults.every((a) => a.status !== 'failed'),
  );
  for (const file of brokenFiles)
    log(`could not run ${path.relative(projectDir, file.name)}: ${file.message?.split('\n')[0] ?? ''}`);
  // A run that failed before any test could (a set-up error) still counts as a failure.
  const failed = Math.max(results.numFailedTests + brokenFiles.length, exitCode === 0 ? 0 : 1) + codeRules.failed;
  if (codeRules.failed) exitCode = 1;
  process.stdout.write(
    `\n${results.numPassedTests + codeRules.passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}\n`,
  );
}

/** The lint, the formatting (Prettier) and the import rules, each one check of the suite; a failure prints each broken rule's reason. */
function checkCodeRules() {
  const counts = { passed: 0, failed: 0 };
  for (const [name, script] of [
    ['lint', 'lint'],
    ['format', 'format:check'],
    ['import rules', 'check:imports'],
  ]) {
    log(`checking the ${name} (npm run ${script})`);
    const result = spawnSync('npm', ['run', '--silent', script], { cwd: projectDir, stdio: 'inherit' });
    if (result.status === 0) counts.passed += 1;
    else {
      counts.failed += 1;
      log(`the ${name} failed: see the reasons above (npm run ${script})`);
    }
  }
  return counts;
}
