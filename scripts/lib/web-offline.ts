// What lets the web app install and start with no signal: a web app manifest with icons made from our own
// icon, and a service worker (workbox-build) that precaches the shell, its scripts, fonts and the scanner's wasm.
import fs from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import { generateSW } from 'workbox-build';

const ROOT = path.resolve(__dirname, '../..');
const ICON = path.join(ROOT, 'assets/images/icon.png');
export const MANIFEST_FILE = 'manifest.webmanifest';
export const SERVICE_WORKER_FILE = 'sw.js';

interface ExpoWebConfig {
  name: string;
  shortName: string;
  themeColor: string;
  backgroundColor: string;
}

function webConfig(): ExpoWebConfig {
  const app = JSON.parse(fs.readFileSync(path.join(ROOT, 'app.json'), 'utf8')) as { expo: { web: ExpoWebConfig } };
  return app.expo.web;
}

/** Icons at the two sizes browsers ask for, plus a maskable one with the safe zone the spec asks for. */
async function writeIcons(dist: string, background: string) {
  const dir = path.join(dist, 'icons');
  fs.mkdirSync(dir, { recursive: true });
  for (const size of [192, 512]) await sharp(ICON).resize(size, size).png().toFile(path.join(dir, `icon-${size}.png`));
  // W3C Web App Manifest "maskable": the important part inside a circle of 80 % of the width.
  const inner = Math.round(512 * 0.8);
  const resized = await sharp(ICON).resize(inner, inner).png().toBuffer();
  await sharp({ create: { width: 512, height: 512, channels: 4, background } })
    .composite([{ input: resized, gravity: 'centre' }])
    .png()
    .toFile(path.join(dir, 'icon-maskable-512.png'));
  await sharp(ICON).resize(180, 180).png().toFile(path.join(dir, 'apple-touch-icon.png'));
}

function writeManifest(dist: string, web: ExpoWebConfig) {
  const manifest = {
    name: web.name,
    short_name: web.shortName,
    start_url: '/',
    scope: '/',
    display: 'standalone',
    theme_color: web.themeColor,
    background_color: web.backgroundColor,
    icons: [
      { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png' },
      { src: '/icons/icon-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    ],
  };
  fs.writeFileSync(path.join(dist, MANIFEST_FILE), `${JSON.stringify(manifest, null, 2)}\n`);
}

/** The exported index.html has no manifest link (single-page output has no +html.tsx); add it. */
function linkManifest(dist: string) {
  const file = path.join(dist, 'index.html');
  const html = fs.readFileSync(file, 'utf8');
  if (html.includes(MANIFEST_FILE)) return;
  const links = `<link rel="manifest" href="/${MANIFEST_FILE}"/><link rel="apple-touch-icon" href="/icons/apple-touch-icon.png"/>`;
  fs.writeFileSync(file, html.replace('</head>', `${links}</head>`));
}

async function writeServiceWorker(dist: string) {
  const { count, size, warnings } = await generateSW({
    globDirectory: dist,
    // The shell, every route's script, the fonts the app loads, the scanner's wasm and the icons.
    globPatterns: [
      'index.html',
      'favicon.ico',
      MANIFEST_FILE,
      'icons/*.png',
      '_expo/static/**/*.{js,css}',
      'wasm/*.wasm',
      'assets/assets/fonts/*.ttf',
      'assets/node_modules/@expo/vector-icons/**/MaterialCommunityIcons.*.ttf',
    ],
    globIgnores: ['**/*.br', '**/*.gz'],
    maximumFileSizeToCacheInBytes: 8 * 1024 * 1024,
    swDest: path.join(dist, SERVICE_WORKER_FILE),
    inlineWorkboxRuntime: true,
    mode: 'production',
    sourcemap: false,
    // Names that already carry a content hash need no extra revision query.
    dontCacheBustURLsMatching: /[.-][0-9a-f]{20,}\.[a-z0-9]+$/,
    // Every client-side route (/sites/3, /l/CODE) starts from the precached shell; the API never does.
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api\//],
    cleanupOutdatedCaches: true,
    clientsClaim: true,
    skipWaiting: true,
  });
  for (const w of warnings) console.warn(`[service worker] ${w}`);
  return { count, size };
}

/** Manifest, icons and service worker into the exported app; returns how much the worker precaches. */
export async function addOfflineSupport(dist: string) {
  const web = webConfig();
  await writeIcons(dist, web.themeColor);
  writeManifest(dist, web);
  linkManifest(dist);
  return writeServiceWorker(dist);
}
