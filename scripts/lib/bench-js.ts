// The JavaScript a page loads before its first render, against a near-blank Expo Router web app (one route that
// shows one QR code) built here in the same run with the same Expo, Metro and router settings.
import { spawnSync } from 'node:child_process';
import express from 'express';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { chromium, type Browser } from 'playwright-core';
import { webStatic } from '@/server/lib/web-static';
import { precompress } from '@/scripts/lib/precompress';
import { CHROMIUM, CHROMIUM_ARGS } from '@/test/e2e/support/chromium';

const ROOT = path.resolve(__dirname, '../..');
const BLANK = path.join(ROOT, '.bench', 'blank-app');

const BLANK_FILES: Record<string, string> = {
  'package.json': JSON.stringify({ name: 'blank-router-app', private: true, main: 'expo-router/entry' }, null, 2),
  'app.json': JSON.stringify(
    { expo: { name: 'Blank', slug: 'blank', web: { bundler: 'metro', output: 'single' }, plugins: [['expo-router', { asyncRoutes: { web: true, default: false } }]] } },
    null,
    2,
  ),
  'babel.config.js': "module.exports = (api) => { api.cache(true); return { presets: ['babel-preset-expo'] }; };\n",
  // The blank app lives inside the project so it resolves the very same installed packages.
  'metro.config.js': [
    "const path = require('node:path');",
    "const { getDefaultConfig } = require('expo/metro-config');",
    'const config = getDefaultConfig(__dirname);',
    "const modules = path.resolve(__dirname, '../../node_modules');",
    'config.watchFolders = [modules];',
    'config.resolver.nodeModulesPaths = [modules];',
    'module.exports = config;',
    '',
  ].join('\n'),
  'app/index.tsx': [
    "import QRCode from 'react-native-qrcode-svg';",
    "import { View } from 'react-native';",
    'export default function Index() {',
    "  return <View testID=\"blank-qr\" style={{ padding: 24 }}><QRCode value=\"https://example.test/l/ABC123\" size={148} /></View>;",
    '}',
    '',
  ].join('\n'),
};

/** Writes and exports the near-blank app; returns its dist folder. */
export function buildBlankApp(log: (line: string) => void): string {
  fs.rmSync(BLANK, { recursive: true, force: true });
  for (const [file, text] of Object.entries(BLANK_FILES)) {
    fs.mkdirSync(path.dirname(path.join(BLANK, file)), { recursive: true });
    fs.writeFileSync(path.join(BLANK, file), text);
  }
  log('building the near-blank Expo Router app (one route, one QR code)…');
  const result = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/expo/bin/cli'), 'export', '-p', 'web', '--output-dir', 'dist', '--clear'], {
    cwd: BLANK,
    stdio: ['ignore', 'ignore', 'inherit'],
    env: { ...process.env, EXPO_OFFLINE: '1', CI: '1', EXPO_NO_TELEMETRY: '1', NODE_ENV: 'production' },
  });
  if (result.status !== 0) throw new Error('the near-blank app did not build');
  // Compressed like ours, so the bytes on the wire compare too.
  precompress(path.join(BLANK, 'dist'));
  return path.join(BLANK, 'dist');
}

/** Serves a built web app the way the product does (precompressed files aside, express.static + the shell). */
export async function serveDist(dist: string) {
  const app = express();
  app.use(webStatic(dist));
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  return { url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`, close: () => new Promise((r) => server.close(r)) };
}

export interface ScriptBytes {
  /** Bytes of JavaScript once decoded. */
  decoded: number;
  /** Bytes on the wire with Chromium's Accept-Encoding (brotli here). */
  transferred: number;
  files: number;
}

/**
 * Loads `url` in a fresh context with no service worker and sums the scripts the page requested before the element
 * with test id `readyTestId` first appeared in the document (its first render). Parts a screen fetches after that
 * (deferred lazy parts) are not counted; whatever was requested while the element was still missing is, even if
 * it was not needed for it. `token` signs in first (written to local storage before the page's own scripts run).
 */
export async function scriptsBeforeFirstRender(browser: Browser, url: string, readyTestId: string, token?: string): Promise<ScriptBytes> {
  const context = await browser.newContext({ serviceWorkers: 'block', viewport: { width: 390, height: 844 } });
  if (token) await context.addInitScript((t) => window.localStorage.setItem('isoledger.token', t), token);
  await context.addInitScript((id) => {
    const w = window as unknown as { __firstRenderAt?: number };
    const seen = () => document.querySelector(`[data-testid="${id}"]`) !== null;
    new MutationObserver((_, observer) => {
      if (w.__firstRenderAt === undefined && seen()) {
        w.__firstRenderAt = performance.now();
        observer.disconnect();
      }
    }).observe(document, { childList: true, subtree: true, attributes: true });
  }, readyTestId);
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  const wire = new Map<string, number>();
  const urls = new Map<string, string>();
  cdp.on('Network.responseReceived', (e) => { if (e.type === 'Script') urls.set(e.requestId, e.response.url); });
  cdp.on('Network.loadingFinished', (e) => { const u = urls.get(e.requestId); if (u) wire.set(u, e.encodedDataLength); });
  await page.goto(url);
  await page.getByTestId(readyTestId).first().waitFor();
  const counted = await page.evaluate(() => {
    const at = (window as unknown as { __firstRenderAt?: number }).__firstRenderAt ?? Infinity;
    return performance
      .getEntriesByType('resource')
      .filter((e) => (e as PerformanceResourceTiming).initiatorType === 'script' && e.startTime <= at)
      .map((e) => e.name);
  });
  // Every script the page asked for has arrived by the time it rendered; wait for the wire sizes of the last ones.
  for (let i = 0; i < 50 && counted.some((u) => !wire.has(u)); i += 1) await page.waitForTimeout(20);
  let decoded = 0;
  for (const u of counted) decoded += (await (await fetch(u, { headers: { 'Accept-Encoding': 'identity' } })).arrayBuffer()).byteLength;
  await context.close();
  return { decoded, transferred: counted.reduce((n, u) => n + (wire.get(u) ?? 0), 0), files: counted.length };
}

export async function launchChromium(extraArgs: string[] = []) {
  return chromium.launch({ executablePath: CHROMIUM, headless: true, args: [...CHROMIUM_ARGS.filter((a) => a !== '--headless'), ...extraArgs] });
}
