#!/usr/bin/env node
// Asks the npm registry whether any package in the production tree is deprecated; exits 1 if one is.
// `node scripts/check-deprecated.mjs` checks the whole tree; `--direct` only package.json's dependencies.
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { log, projectDir, run } from './lib/system.mjs';

const exec = promisify(execFile);
const AT_ONCE = 4;
const directOnly = process.argv.includes('--direct');

/** name@version of every production package, each once, from npm's own view of node_modules. */
function productionPackages() {
  const tree = JSON.parse(run('npm', ['ls', '--omit=dev', '--all', '--json'], { cwd: projectDir, quiet: true }));
  const found = new Map();
  const walk = (dependencies = {}) => {
    for (const [name, node] of Object.entries(dependencies)) {
      if (!node.version || found.has(`${name}@${node.version}`)) continue;
      found.set(`${name}@${node.version}`, { name, version: node.version });
      if (!directOnly) walk(node.dependencies);
    }
  };
  walk(tree.dependencies);
  return [...found.values()];
}

async function deprecation({ name, version }) {
  const { stdout } = await exec('npm', ['view', `${name}@${version}`, 'deprecated', '--json'], { cwd: projectDir });
  const text = stdout.trim();
  return text ? JSON.parse(text) : null;
}

const packages = productionPackages();
log(`asking the npm registry about ${packages.length} production package(s), ${AT_ONCE} at a time`);
const deprecated = [];
for (let i = 0; i < packages.length; i += AT_ONCE) {
  const batch = packages.slice(i, i + AT_ONCE);
  const notes = await Promise.all(batch.map(deprecation));
  batch.forEach((pkg, j) => notes[j] && deprecated.push(`${pkg.name}@${pkg.version}: ${notes[j]}`));
}
if (deprecated.length > 0) {
  process.stderr.write(
    `larderly: ${deprecated.length} deprecated production package(s):\n  ${deprecated.join('\n  ')}\n`,
  );
  process.exit(1);
}
log(`none of the ${packages.length} production package(s) is deprecated`);
