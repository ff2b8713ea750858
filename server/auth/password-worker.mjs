// Runs bcrypt in a worker thread, so a burst of sign-ins cannot stall the app's event loop.
// Plain JavaScript: a worker thread starts outside the TypeScript loader of its parent.
import { parentPort, threadId } from 'node:worker_threads';
import bcrypt from 'bcryptjs';

parentPort.on('message', ({ id, op, password, hash, cost }) => {
  try {
    const result = op === 'hash' ? bcrypt.hashSync(password, cost) : bcrypt.compareSync(password, hash);
    parentPort.postMessage({ id, result, threadId });
  } catch (error) {
    parentPort.postMessage({ id, error: error instanceof Error ? error.message : String(error), threadId });
  }
});
