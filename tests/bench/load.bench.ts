// 100 connections for 30 s over a mix of reads and writes against a running server, signed in as the demo cook.
// Run: PORT=3000 node --import tsx tests/bench/load.bench.ts   (the server from `npm start` on that PORT, or BASE_URL=http://host:port)
// @ts-expect-error autocannon ships no type declarations
import autocannon from 'autocannon';
import { loadavg } from 'node:os';

const BASE_URL = (process.env.BASE_URL ?? `http://127.0.0.1:${process.env.PORT ?? 3000}`).replace(/\/$/, '');
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 100);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 30);
// The floor: the same connections on GET /households/:hid (the session and the household guard, almost nothing behind).
const FLOOR_SECONDS = Number(process.env.BENCH_FLOOR_SECONDS ?? 10);

async function call(path: string, init: RequestInit & { cookie?: string } = {}) {
  const response = await fetch(`${BASE_URL}${path}`, {
    ...init,
    headers: { 'Content-Type': 'application/json', Origin: BASE_URL, ...(init.cookie ? { Cookie: init.cookie } : {}) },
  });
  if (!response.ok)
    throw new Error(`${init.method ?? 'GET'} ${path} answered ${response.status}: ${await response.text()}`);
  return response;
}

const login = await call('/api/auth/login', {
  method: 'POST',
  body: JSON.stringify({ email: 'cook@larderly.test', password: 'pantry-demo-2026' }),
});
const cookie = login.headers.get('set-cookie')!.split(';')[0]!;
const me = await (await call('/api/auth/me', { cookie })).json();
const hid: string = me.memberships[0].householdId;
const base = `/api/households/${hid}`;
const todos: { id: string; kind: string }[] = (await (await call(`${base}/todos`, { cookie })).json()).todos;
// The to-do every connection moves: the restock one, whose answer carries its batch plan worked out anew (the heavier
// answer), in every run. Before, the bench took the list's first, which each run moved to the end: one run in four
// moved the restock to-do, and those were the runs with the highest latencies.
const todo = todos.find((t) => t.kind === 'restock') ?? todos[0]!;
const products: { id: string }[] = (await (await call(`${base}/products`, { cookie })).json()).products;
const week = await (await call(`${base}/week`, { cookie })).json();
const entries: { id: string; servings: number }[] = week.days.flatMap(
  (d: { entries: { id: string; servings: number }[] }) => d.entries,
);
if (todos.length === 0 || entries.length === 0)
  throw new Error(
    'The demo household needs to-dos and planned meals: seed it with `server/setup.ts setup --seed-demo`.',
  );

// Seven reads to three writes, in two mixes run one after the other. "repeat": every write is one a cook may repeat
// (the same servings, the same minimum, the to-do already last), so after its first it changes nothing and writes
// nothing (a write that changes nothing moves no version and keeps every cached answer). "change": every write
// really changes its row (servings 2, 3, 2, ...; the minimum 2, 3, ...; the to-do to the top, then the bottom), so
// each one moves a version and the reads after it work their answers out again.
const json = (body: unknown) => JSON.stringify(body);
type Write = { method: 'PATCH'; path: string; body: string; setupRequest?: (request: object) => object };
/** A write whose body takes the next of `bodies` at each send, across all connections. */
function alternating(path: string, bodies: unknown[]): Write {
  let sent = 0;
  return {
    method: 'PATCH',
    path,
    body: json(bodies[0]),
    setupRequest: (request) => ({ ...request, body: json(bodies[sent++ % bodies.length]) }),
  };
}
const last = todos.length - 1;
const writes = {
  repeat: [
    { method: 'PATCH', path: `${base}/todos/${todo.id}`, body: json({ position: last }) },
    { method: 'PATCH', path: `${base}/plan-entries/${entries[0]!.id}`, body: json({ servings: 3 }) },
    { method: 'PATCH', path: `${base}/products/${products[0]!.id}`, body: json({ minJars: 2 }) },
  ],
  change: [
    alternating(`${base}/todos/${todo.id}`, [{ position: 0 }, { position: last }]),
    alternating(`${base}/plan-entries/${entries[0]!.id}`, [{ servings: 2 }, { servings: 3 }]),
    alternating(`${base}/products/${products[0]!.id}`, [{ minJars: 2 }, { minJars: 3 }]),
  ],
} satisfies Record<string, Write[]>;
type Mix = keyof typeof writes;
const mixes = (process.env.BENCH_MIXES ?? 'repeat,change').split(',') as Mix[];
for (const mix of mixes) if (!(mix in writes)) throw new Error(`BENCH_MIXES: "${mix}" is not one of repeat, change.`);

const fmt = (l: number[]) => l.map((x) => x.toFixed(2)).join(' ');
const percentile = (sorted: number[], p: number) =>
  sorted.length === 0 ? 0 : sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
let failures = 0;
const served: Partial<Record<Mix, number>> = {};

for (const mix of mixes) {
  const [todoMove, planEdit, productEdit] = writes[mix];
  const requests = [
    { method: 'GET', path: `${base}/today` },
    { method: 'GET', path: `${base}/week` },
    todoMove,
    { method: 'GET', path: `${base}/jars?state=sealed` },
    { method: 'GET', path: `${base}/products` },
    planEdit,
    { method: 'GET', path: `${base}/todos` },
    { method: 'GET', path: `${base}/restock` },
    productEdit,
    { method: 'GET', path: `${base}/fridge` },
  ];
  console.log(
    `load, writes that ${mix === 'repeat' ? 'repeat (the same values each time)' : 'change (alternating values)'}: ${CONNECTIONS} connections for ${SECONDS} s against ${BASE_URL}, ${requests.length} requests in turn (7 reads, 3 writes), as cook@larderly.test`,
  );
  const loadBefore = loadavg();
  const instance = autocannon({
    url: BASE_URL,
    connections: CONNECTIONS,
    duration: SECONDS,
    headers: { cookie, 'content-type': 'application/json', origin: BASE_URL },
    requests,
  });
  // Each connection sends the requests in turn, one at a time, so the one a response answers is its client's current one.
  const byRoute = requests.map(() => ({ times: [] as number[], failed: 0 }));
  instance.on(
    'response',
    (client: { requestIterator: { currentRequestIndex: number } }, status: number, _bytes: number, time: number) => {
      const route = byRoute[client.requestIterator.currentRequestIndex];
      if (!route) return;
      route.times.push(time);
      if (status < 200 || status > 299) route.failed += 1;
    },
  );
  const result = await instance;
  const loadAfter = loadavg();

  failures += result.errors + result.timeouts + result.non2xx;
  served[mix] = result.requests.average;
  console.log(
    `requests: ${result.requests.total} (${Math.round(result.requests.average)}/s), 2xx ${result['2xx']}, non-2xx ${result.non2xx}, errors ${result.errors}, timeouts ${result.timeouts}`,
  );
  console.log(
    `answers by status: ${JSON.stringify(Object.fromEntries(Object.entries(result.statusCodeStats ?? {}).map(([code, s]) => [code, (s as { count: number }).count])))}`,
  );
  console.log(`latency: median ${result.latency.p50} ms, p99 ${result.latency.p99} ms, max ${result.latency.max} ms`);
  console.log('by route (answers, median, p99, max in ms, non-2xx):');
  requests.forEach((request, i) => {
    const times = byRoute[i]!.times.sort((a, b) => a - b);
    const route = `${request.method} ${request.path.replace(base, '').replace(/[0-9a-f-]{36}/g, ':id')}`;
    console.log(
      `  ${route.padEnd(30)} ${String(times.length).padStart(6)}  ${percentile(times, 50).toFixed(1).padStart(7)}  ${percentile(times, 99).toFixed(1).padStart(7)}  ${(times.at(-1) ?? 0).toFixed(1).padStart(7)}  ${byRoute[i]!.failed}`,
    );
  });
  console.log(`load average: ${fmt(loadBefore)} before, ${fmt(loadAfter)} after`);
}
if (FLOOR_SECONDS > 0) {
  const floor = await autocannon({
    url: `${BASE_URL}${base}`,
    connections: CONNECTIONS,
    duration: FLOOR_SECONDS,
    headers: { cookie, origin: BASE_URL },
  });
  console.log(
    `floor, GET /households/:hid for ${FLOOR_SECONDS} s: ${Math.round(floor.requests.average)}/s, median ${floor.latency.p50} ms, p99 ${floor.latency.p99} ms, non-2xx ${floor.non2xx + floor.errors}; ${Object.entries(
      served,
    )
      .map(
        ([mix, average]) => `the ${mix} mix made ${(average / floor.requests.average).toFixed(3)} of the floor's req/s`,
      )
      .join(', ')} (load average ${fmt(loadavg())})`,
  );
}
console.log(failures === 0 ? 'zero errors: yes' : `zero errors: NO (${failures} failed requests)`);
process.exit(failures === 0 ? 0 : 1);
