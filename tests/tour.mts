// A quick look around the running demo as each role (not part of the test suite).
import { launch, signIn } from './e2e/browser';
const base = 'http://127.0.0.1:4100';
const b = await launch();
async function shot(email: string, path: string, name: string) {
  const p = await (await b.newContext({ viewport: { width: 1366, height: 900 } })).newPage();
  await signIn(p, email); await p.waitForURL(`${base}/`);
  await p.goto(`${base}${path}`); await p.waitForTimeout(2000);
  await p.screenshot({ path: `/tmp/tour-${name}.png`, fullPage: true });
}
await shot('maya@larkspur.example', '/requests', 'buyer-requests');
await shot('daniel@larkspur.example', '/requests/1', 'purchasing-request');
await shot('chidi@okafor.example', '/open-requests', 'estimator-board');
await shot('chidi@okafor.example', '/requests/1', 'estimator-request');
await b.close();
