import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { buildWebIfChanged } from '@/scripts/lib/web-build';

const say = (line: string) => console.log(`[isoledger] ${line}`);
const RESULTS = path.resolve('test-results');

interface Counts { passed: number; failed: number; skipped: number }

/** Runs one vitest configuration; each configuration's global setup starts and stops the services it needs. */
function runVitest(name: string, args: string[]): Counts & { ok: boolean } {
  const report = path.join(RESULTS, `${name}.json`);
  fs.rmSync(report, { force: true });
  const result = spawnSync('node_modules/.bin/vitest', ['run', ...args, '--reporter=default', '--reporter=json', `--outputFile.json=${report}`], {
    stdio: 'inherit',
    env: { ...process.env, VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' },
  });
  let counts: Counts = { passed: 0, failed: 0, skipped: 0 };
  if (fs.existsSync(report)) {
    const json = JSON.parse(fs.readFileSync(report, 'utf8'));
    counts = { passed: json.numPassedTests, failed: json.numFailedTests + (json.numTotalTestSuites && json.success === false && json.numFailedTests === 0 ? 1 : 0), skipped: json.numPendingTests + json.numTodoTests };
  } else {
    counts.failed = 1;
  }
  return { ...counts, ok: result.status === 0 };
}

async function main() {
  fs.mkdirSync(RESULTS, { recursive: true });
  const only = process.argv[2];
  const total: Counts = { passed: 0, failed: 0, skipped: 0 };
  let ok = true;
  const add = (r: Counts & { ok: boolean }) => {
    total.passed += r.passed; total.failed += r.failed; total.skipped += r.skipped; ok &&= r.ok;
  };

  if (only !== 'e2e') {
    say('unit and API tests');
    add(runVitest('unit', ['-c', 'vitest.config.mts']));
  }
  if (only !== 'unit') {
    await buildWebIfChanged(say);
    say('end-to-end tests in Chromium');
    add(runVitest('e2e', ['-c', 'vitest.e2e.config.mts']));
  }
  if (!ok && total.failed === 0) total.failed = 1;
  console.log(`${total.passed} passed, ${total.failed} failed, ${total.skipped} skipped`);
  process.exit(ok ? 0 : 1);
}

main().catch((err) => {
  console.error(err);
  console.log('0 passed, 1 failed');
  process.exit(1);
});
