// The top entries of a V8 CPU profile (from `node --cpu-prof`) by self time, and by package or folder.
// Run: node --import tsx tests/bench/profile-top.ts <file.cpuprofile> [entries]
import { readFileSync } from 'node:fs';

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  hitCount: number;
  children?: number[];
}

const [file, entries = '15'] = process.argv.slice(2);
if (!file) throw new Error('Give the .cpuprofile file to read.');
const profile = JSON.parse(readFileSync(file, 'utf8')) as { nodes: ProfileNode[]; samples: number[] };
const total = profile.samples.length;
const hits = new Map<number, number>();
for (const id of profile.samples) hits.set(id, (hits.get(id) ?? 0) + 1);

const where = (url: string) => {
  if (!url) return '(native)';
  const inModules = url.match(/node_modules\/((?:@[^/]+\/)?[^/]+)/);
  if (inModules) return inModules[1]!;
  if (url.startsWith('node:')) return url;
  const own = url.match(/\/(server|shared|src)\/(.*)$/);
  return own ? `${own[1]}/${own[2]!.split('/')[0]}` : url.replace(/^.*\//, '');
};

const byFunction = new Map<string, number>();
const byPlace = new Map<string, number>();
for (const node of profile.nodes) {
  const n = hits.get(node.id) ?? 0;
  if (n === 0) continue;
  const { functionName, url, lineNumber } = node.callFrame;
  const name = `${functionName || '(anonymous)'} ${url ? `${url.replace(/^.*node_modules\//, '').replace(/^file:\/\/.*?\/(server|shared|tests)\//, '$1/')}:${lineNumber + 1}` : ''}`;
  byFunction.set(name, (byFunction.get(name) ?? 0) + n);
  byPlace.set(where(url), (byPlace.get(where(url)) ?? 0) + n);
}
const top = (map: Map<string, number>) =>
  [...map.entries()]
    .sort((a, b) => b[1] - a[1])
    .slice(0, Number(entries))
    .map(([name, n]) => `${((100 * n) / total).toFixed(1).padStart(5)}%  ${name}`);
console.log(`${total} samples`);
console.log('\nself time by function:');
for (const line of top(byFunction)) console.log(`  ${line}`);
console.log('\nself time by package or folder:');
for (const line of top(byPlace)) console.log(`  ${line}`);

// Inclusive time by package or folder: a sample counts once for every place on its stack, so a middleware's
// share includes the library code it calls (express-session's share holds its store's query, and so on).
const parent = new Map<number, number>();
for (const node of profile.nodes) for (const child of node.children ?? []) parent.set(child, node.id);
const nodeById = new Map(profile.nodes.map((node) => [node.id, node]));
const inclusive = new Map<string, number>();
for (const [id, n] of hits) {
  const places = new Set<string>();
  for (let at: number | undefined = id; at !== undefined; at = parent.get(at)) {
    const url = nodeById.get(at)!.callFrame.url;
    if (url) places.add(where(url));
  }
  for (const place of places) inclusive.set(place, (inclusive.get(place) ?? 0) + n);
}
console.log('\ntotal time (self and callees) by package or folder:');
for (const line of top(inclusive)) console.log(`  ${line}`);
