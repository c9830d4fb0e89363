// `npm test`: the same set-up as `npm start` on its own ports and data folder, then every test
// (unit, integration against the real services, end-to-end in Chromium) and one summary line.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { profile, repoRoot } from './lib/profile';
import { bringUp } from './lib/stack';
import { Supervisor } from './lib/supervisor';
import { ensureDebianPackage } from './lib/system';

interface VitestReport {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests: number;
  numTodoTests: number;
  numTotalTestSuites: number;
  numFailedTestSuites: number;
}

const p = profile('test');
const supervisor = new Supervisor(path.join(p.dataDir, 'logs'), { echo: false });
supervisor.handleSignals();
const report = path.join(p.dataDir, 'vitest-report.json');
let exitCode = 1;

try {
  ensureDebianPackage('/usr/bin/chromium', 'chromium', 'The end-to-end tests (headless Chromium)');
  // Start from empty stores each run, so a run never depends on the one before.
  for (const dir of ['s3', 'mail', 'logs', 'screenshots'])
    rmSync(path.join(p.dataDir, dir), { recursive: true, force: true });
  const env = await bringUp(p, supervisor, { fresh: true });
  rmSync(report, { force: true });
  const vitest = spawnSync(
    process.execPath,
    [
      path.join(repoRoot, 'node_modules/vitest/vitest.mjs'),
      'run',
      '--reporter=default',
      '--reporter=json',
      `--outputFile.json=${report}`,
      ...process.argv.slice(2),
    ],
    {
      cwd: repoRoot,
      stdio: 'inherit',
      env: { ...process.env, ...env, KERFMARK_TEST_RUN: '1', SCREENSHOT_DIR: path.join(p.dataDir, 'screenshots') },
    },
  );
  if (!existsSync(report)) {
    console.error('The test runner stopped before writing its report.');
    console.log('0 passed, 1 failed');
  } else {
    const result = JSON.parse(readFileSync(report, 'utf8')) as VitestReport;
    // A file that failed to load counts as a failure even though none of its tests ran.
    const failed = result.numFailedTests + (result.numFailedTests === 0 ? result.numFailedTestSuites : 0);
    const skipped = result.numPendingTests + result.numTodoTests;
    console.log(`\n${result.numPassedTests} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
    exitCode = failed === 0 && vitest.status === 0 && result.numPassedTests > 0 ? 0 : 1;
  }
} catch (error) {
  console.error(`\nThe test set-up failed: ${(error as Error).message}`);
  console.log('0 passed, 1 failed');
}
await supervisor.stopAll(exitCode);
