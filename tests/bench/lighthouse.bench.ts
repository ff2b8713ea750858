// Lighthouse (mobile preset: a mid-range phone on a slow 4G link, simulated) on the sign-in, Today, Week and
// Shelf screens of the demo household, against a running server; prints performance, LCP and accessibility.
// Run: npm start (in another terminal), then npm run bench:lighthouse   (BASE_URL=http://host:port for another server;
// CHROME_PATH for another Chromium than Debian's /usr/bin/chromium; LIGHTHOUSE_REPORTS=<dir> keeps each screen's report)
import { mkdirSync, writeFileSync } from 'node:fs';
import * as chromeLauncher from 'chrome-launcher';
import lighthouse from 'lighthouse';

const BASE_URL = (process.env.BASE_URL ?? 'http://127.0.0.1:3000').replace(/\/$/, '');
const GOALS = { performance: 90, lcpSeconds: 2.5, accessibility: 100 };

const login = await fetch(`${BASE_URL}/api/auth/login`, {
  method: 'POST',
  headers: { 'Content-Type': 'application/json', Origin: BASE_URL },
  body: JSON.stringify({ email: 'keeper@larderly.test', password: 'pantry-demo-2026' }),
});
if (!login.ok)
  throw new Error(`Sign-in as the demo keeper answered ${login.status}: is the demo household seeded (npm start)?`);
const cookie = login.headers.get('set-cookie')!.split(';')[0]!;
const me = await (await fetch(`${BASE_URL}/api/auth/me`, { headers: { Cookie: cookie } })).json();
const hid: string =
  me.memberships.find((m: { householdName: string }) => m.householdName === 'Calloway Hollow')?.householdId ??
  me.memberships[0].householdId;

const screens = [
  { screen: 'sign-in', path: '/sign-in', signedIn: false },
  { screen: 'Today', path: `/h/${hid}`, signedIn: true },
  { screen: 'Week', path: `/h/${hid}/week`, signedIn: true },
  { screen: 'Shelf', path: `/h/${hid}/shelf`, signedIn: true },
];

const chrome = await chromeLauncher.launch({
  chromePath: process.env.CHROME_PATH ?? '/usr/bin/chromium',
  chromeFlags: ['--headless=new', '--no-sandbox', '--disable-gpu', '--disable-dev-shm-usage'],
});
const rows: Record<string, Record<string, number | string>> = {};
try {
  for (const { screen, path, signedIn } of screens) {
    const run = () =>
      lighthouse(`${BASE_URL}${path}`, {
        port: chrome.port,
        output: 'json',
        logLevel: 'error',
        onlyCategories: ['performance', 'accessibility'],
        // The session cookie rides on every request the page makes, as after a real sign-in.
        extraHeaders: signedIn ? { Cookie: cookie } : undefined,
      });
    // On a busy machine the trace is sometimes lost (NO_NAVSTART), which would print a score of 0: measure again.
    let result = await run();
    for (let attempt = 1; attempt < 3 && result?.lhr.runtimeError; attempt++) result = await run();
    if (!result) throw new Error(`Lighthouse gave no result for ${path}`);
    if (result.lhr.runtimeError)
      throw new Error(`Lighthouse could not measure ${path}: ${result.lhr.runtimeError.message}`);
    const { categories, audits, finalDisplayedUrl } = result.lhr;
    if (process.env.LIGHTHOUSE_REPORTS) {
      mkdirSync(process.env.LIGHTHOUSE_REPORTS, { recursive: true });
      writeFileSync(`${process.env.LIGHTHOUSE_REPORTS}/${screen}.json`, JSON.stringify(result.lhr));
    }
    if (!finalDisplayedUrl.endsWith(path))
      throw new Error(`${path} ended on ${finalDisplayedUrl}: the screen was not the one measured`);
    const performance = Math.round((categories.performance?.score ?? 0) * 100);
    const accessibility = Math.round((categories.accessibility?.score ?? 0) * 100);
    const lcpSeconds = Number(((audits['largest-contentful-paint']?.numericValue ?? 0) / 1000).toFixed(2));
    const met =
      performance >= GOALS.performance && lcpSeconds <= GOALS.lcpSeconds && accessibility >= GOALS.accessibility;
    // The other metrics the performance score weighs (Lighthouse 12's scoring: FCP, SI, TBT, CLS beside LCP).
    const ms = (id: string) => Math.round(audits[id]?.numericValue ?? 0);
    rows[screen] = {
      performance,
      lcpSeconds,
      accessibility,
      met: met ? 'yes' : 'no',
      fcpMs: ms('first-contentful-paint'),
      speedIndexMs: ms('speed-index'),
      blockingMs: ms('total-blocking-time'),
      layoutShift: Number((audits['cumulative-layout-shift']?.numericValue ?? 0).toFixed(3)),
    };
  }
} finally {
  await chrome.kill();
}
const os = await import('node:os');
console.log(
  `Lighthouse ${(await import('lighthouse/package.json', { with: { type: 'json' } })).default.version}, mobile preset, ${BASE_URL}; load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores`,
);
console.table(rows);
console.log(
  `goals: performance >= ${GOALS.performance}, LCP <= ${GOALS.lcpSeconds} s, accessibility ${GOALS.accessibility}`,
);
