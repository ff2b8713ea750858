// `npm test`: the same set-up as `npm start` against separate test databases, then every test.
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { ensureChromium, ensureNodeModules, log, projectDir, run } from './lib/system.mjs';
import { startCluster } from './lib/postgres.mjs';

ensureNodeModules();
ensureChromium();
const { buildClient, recreateDatabase, setUpSchema } = await import('./lib/database.mjs');

const cluster = startCluster();
let exitCode = 1;
try {
  const template = 'larderly_test_template';
  await recreateDatabase(cluster, template);
  setUpSchema(cluster.url(template));
  log('building the client');
  buildClient();

  const resultsDir = path.join(projectDir, 'test-results');
  mkdirSync(resultsDir, { recursive: true });
  const resultsFile = path.join(resultsDir, 'vitest.json');
  const extraArgs = process.argv.slice(2);
  try {
    run(process.execPath, ['node_modules/vitest/vitest.mjs', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${resultsFile}`, ...extraArgs], {
      cwd: projectDir,
      env: {
        ...process.env,
        NODE_ENV: 'test',
        LARDERLY_TEST_ADMIN_URL: cluster.url('postgres'),
        LARDERLY_TEST_TEMPLATE: template,
        LARDERLY_PG_BIN: cluster.bin,
      },
    });
    exitCode = 0;
  } catch {
    exitCode = 1;
  }
  if (existsSync(resultsFile)) {
    const results = JSON.parse(readFileSync(resultsFile, 'utf8'));
    const skipped = results.numPendingTests + results.numTodoTests;
    if (results.numFailedTests > 0 || results.numFailedTestSuites > 0) exitCode = 1;
    const failedSuites = results.testResults.filter((s) => s.status === 'failed' && s.assertionResults.every((a) => a.status !== 'failed'));
    for (const suite of failedSuites) log(`failed to run: ${path.relative(projectDir, suite.name)}: ${suite.message?.split('\n')[0] ?? ''}`);
    // A run that failed before any test could (a set-up error) still counts as a failure.
    const failed = Math.max(results.numFailedTests + failedSuites.length, exitCode === 0 ? 0 : 1);
    process.stdout.write(`\n${results.numPassedTests} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}\n`);
  } else {
    process.stdout.write('\n0 passed, 1 failed\n');
  }
} finally {
  cluster.stop();
}
process.exit(exitCode);
