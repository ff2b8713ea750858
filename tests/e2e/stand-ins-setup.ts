import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startStandIns } from '../support/stand-ins';

declare module 'vitest' {
  export interface ProvidedContext {
    standInsDir: string;
    pushOrigin: string;
  }
}

/**
 * The local SMTP catcher and push endpoint for the browser tests, started before the server so
 * it sends through them. They keep what they catch as files the test files read.
 */
export default async function startBrowserStandIns(project: TestProject) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'larderly-e2e-stand-ins-'));
  const standIns = await startStandIns(dir);
  // The server runs in production mode here, where the app trusts no extra certificate of its own: Node is told to.
  Object.assign(process.env, standIns.env, { NODE_EXTRA_CA_CERTS: standIns.certFile });
  project.provide('standInsDir', dir);
  project.provide('pushOrigin', standIns.push.origin);
  return async () => {
    await standIns.close();
    rmSync(dir, { recursive: true, force: true });
  };
}
