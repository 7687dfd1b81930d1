import { spawnSync } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { precompress } from '@/scripts/lib/precompress';
import { checkScriptSplit } from '@/scripts/lib/web-chunks';
import { addOfflineSupport } from '@/scripts/lib/web-offline';
import { copyZxingWasm } from '@/scripts/lib/zxing-wasm';

const ROOT = path.resolve(__dirname, '../..');
const DIST = path.join(ROOT, 'dist');
const STAMP = path.join(DIST, '.source-hash');
const SOURCES = ['app', 'components', 'hooks', 'shared', 'assets', 'app.json', 'package-lock.json', 'metro.config.js', 'babel.config.js', 'scripts/metro', 'scripts/lib/web-build.ts', 'scripts/lib/zxing-wasm.ts', 'scripts/lib/precompress.ts', 'scripts/lib/web-offline.ts', 'scripts/lib/web-chunks.ts'];

function hashTree(hash: crypto.Hash, target: string) {
  if (!fs.existsSync(target)) return;
  const stat = fs.statSync(target);
  if (stat.isDirectory()) {
    for (const name of fs.readdirSync(target).sort()) hashTree(hash, path.join(target, name));
  } else {
    hash.update(path.relative(ROOT, target));
    hash.update(fs.readFileSync(target));
  }
}

export function sourceHash(): string {
  const hash = crypto.createHash('sha256');
  for (const s of SOURCES) hashTree(hash, path.join(ROOT, s));
  return hash.digest('hex');
}

/** Exports the web app with Expo (offline) into dist/, then copies what the scanner needs from node_modules. */
export async function buildWeb(log: (line: string) => void) {
  log('building the web app (expo export -p web)…');
  const started = Date.now();
  const result = spawnSync('npx', ['expo', 'export', '-p', 'web', '--output-dir', 'dist', '--clear'], {
    cwd: ROOT,
    stdio: ['ignore', 'inherit', 'inherit'],
    env: { ...process.env, EXPO_OFFLINE: '1', CI: '1', EXPO_NO_TELEMETRY: '1' },
  });
  if (result.status !== 0) throw new Error('expo export failed');
  const precached = await afterExport(DIST);
  log(`service worker precaches ${precached.count} files (${(precached.size / 1024 / 1024).toFixed(1)} MB)`);
  fs.writeFileSync(STAMP, sourceHash());
  log(`web app built in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}

/**
 * The web scanner's QR reader (barcode-detector → zxing-wasm) would fetch its .wasm from a public CDN; we copy the
 * exact installed binary into the build and the app points the library at it (components/labels/zxing-setup.web.ts).
 */
async function afterExport(dist: string) {
  // The split made by scripts/metro/route-chunks.js: every module a script needs is defined before it runs.
  checkScriptSplit(dist);
  copyZxingWasm(path.join(dist, 'wasm'));
  const precached = await addOfflineSupport(dist);
  // Last, so that every file written above is compressed too.
  precompress(dist);
  return precached;
}

export async function buildWebIfChanged(log: (line: string) => void) {
  const current = sourceHash();
  if (fs.existsSync(STAMP) && fs.readFileSync(STAMP, 'utf8') === current && fs.existsSync(path.join(DIST, 'index.html'))) {
    log('web app is up to date');
    return;
  }
  await buildWeb(log);
}
