import { afterAll, beforeAll } from 'vitest';
import { bareApp } from './bare-app';
import { startStandIns, type StandIns } from './stand-ins';

/** For one test file: the local mail catcher and push endpoint, and the app wired to them, closed after. */
export function withStandInsApp(ready: (app: ReturnType<typeof bareApp>, standIns: StandIns) => void) {
  let app: ReturnType<typeof bareApp> | undefined;
  let standIns: StandIns | undefined;
  beforeAll(async () => {
    standIns = await startStandIns();
    app = bareApp(standIns.env);
    ready(app, standIns);
  });
  afterAll(async () => {
    await app?.close();
    await standIns?.close();
  });
}
