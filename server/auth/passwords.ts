import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';

type Job = { op: 'hash'; password: string; cost: number } | { op: 'compare'; password: string; hash: string };
interface Pending {
  worker: Worker;
  resolve: (value: string | boolean) => void;
  reject: (error: Error) => void;
}
interface PoolWorker {
  worker: Worker;
  busy: number;
}

const WORKER_URL = new URL('./password-worker.mjs', import.meta.url);
const SIZE = Math.max(1, Math.min(2, availableParallelism() - 1));
const workers: PoolWorker[] = [];
const pending = new Map<number, Pending>();
const threadsUsed = new Set<number>();
let nextId = 1;
let jobsDone = 0;

function startWorker(): PoolWorker {
  const entry: PoolWorker = { worker: new Worker(WORKER_URL), busy: 0 };
  entry.worker.on('message', (message: { id: number; result?: string | boolean; error?: string; threadId: number }) => {
    threadsUsed.add(message.threadId);
    jobsDone += 1;
    const job = pending.get(message.id);
    pending.delete(message.id);
    entry.busy -= 1;
    // An idle worker must not keep a finished process (a script, a test run) alive.
    if (entry.busy === 0) entry.worker.unref();
    if (message.error !== undefined) job?.reject(new Error(message.error));
    else job?.resolve(message.result!);
  });
  entry.worker.on('error', (error) => {
    workers.splice(workers.indexOf(entry), 1);
    for (const [id, job] of pending) {
      if (job.worker !== entry.worker) continue;
      pending.delete(id);
      job.reject(error);
    }
  });
  entry.worker.unref();
  workers.push(entry);
  return entry;
}

/** Sends the job to the least busy worker thread of a small pool. */
function run(job: Job): Promise<string | boolean> {
  const entry = workers.length < SIZE ? startWorker() : workers.reduce((a, b) => (b.busy < a.busy ? b : a));
  const id = nextId++;
  entry.busy += 1;
  entry.worker.ref();
  return new Promise((resolve, reject) => {
    pending.set(id, { worker: entry.worker, resolve, reject });
    entry.worker.postMessage({ id, ...job });
  });
}

export const hashPassword = (password: string, cost: number) => run({ op: 'hash', password, cost }) as Promise<string>;

// Compared against when the e-mail is unknown, so both failures take the same time: made once per cost, in a worker,
// at the cost new accounts are hashed with.
const unknownUserHashes = new Map<number, Promise<string>>();
function unknownUserHash(cost: number) {
  if (!unknownUserHashes.has(cost)) unknownUserHashes.set(cost, hashPassword('no such user in larderly', cost));
  return unknownUserHashes.get(cost)!;
}

export async function checkPassword(password: string, hash: string | undefined, cost: number) {
  const matches = (await run({ op: 'compare', password, hash: hash ?? (await unknownUserHash(cost)) })) as boolean;
  return hash !== undefined && matches;
}

/** How many hashes and comparisons have finished, and on which worker threads (never the main thread, 0). */
export const passwordWork = () => ({ jobs: jobsDone, threads: [...threadsUsed] });
