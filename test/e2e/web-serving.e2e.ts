import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import zlib from 'node:zlib';
import { describe, expect, inject, it } from 'vitest';
import { eagerScripts, readScriptModules, unmetRequirements } from '@/scripts/lib/web-chunks';

const baseUrl = inject('baseUrl');
const DIST = path.resolve('dist');

interface RawResponse {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: Buffer;
}

/** A plain HTTP GET that leaves the body as sent (fetch would undo the compression before we could see it). */
function get(urlPath: string, headers: Record<string, string> = {}): Promise<RawResponse> {
  return new Promise((resolve, reject) => {
    http
      .get(`${baseUrl}${urlPath}`, { headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
      })
      .on('error', reject);
  });
}

function firstFile(dir: string, pattern: RegExp): string {
  const found = fs.readdirSync(path.join(DIST, dir), { recursive: true, encoding: 'utf8' }).find((f) => pattern.test(f));
  if (!found) throw new Error(`no ${pattern} under dist/${dir}`);
  return `/${dir}/${found}`;
}

describe('the built web app as the server sends it', () => {
  const entry = () => firstFile('_expo/static/js/web', /^entry-[0-9a-f]+\.js$/);

  it('sends the hashed bundle brotli-compressed, byte-identical once decoded, cached for a year as immutable', async () => {
    const file = entry();
    const res = await get(file, { 'Accept-Encoding': 'gzip, deflate, br' });
    expect(res.status).toBe(200);
    // RFC 9110 §8.4 Content-Encoding; RFC 7932 brotli
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    // RFC 9111 §5.2.2.1 max-age; RFC 8246 immutable
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const plain = fs.readFileSync(path.join(DIST, file));
    expect(zlib.brotliDecompressSync(res.body).equals(plain)).toBe(true);
    expect(res.body.length).toBeLessThan(plain.length / 3);
  });

  it('falls back to gzip for a browser without brotli, and to the plain file when no encoding is accepted', async () => {
    const file = entry();
    const plain = fs.readFileSync(path.join(DIST, file));
    const gz = await get(file, { 'Accept-Encoding': 'gzip' });
    // RFC 1952 gzip
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(zlib.gunzipSync(gz.body).equals(plain)).toBe(true);
    const none = await get(file, { 'Accept-Encoding': 'identity' });
    expect(none.headers['content-encoding']).toBeUndefined();
    expect(none.body.equals(plain)).toBe(true);
    expect(none.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('asks the browser to check index.html every time, on / and on a client-side route', async () => {
    for (const url of ['/', '/index.html', '/l/NO-SUCH-CODE']) {
      const res = await get(url, { 'Accept-Encoding': 'br, gzip' });
      expect(res.status).toBe(200);
      // RFC 9111 §5.2.2.4 no-cache
      expect(res.headers['cache-control']).toBe('no-cache');
      expect(res.headers['content-type']).toMatch(/text\/html/);
      expect(['br', 'gzip']).toContain(res.headers['content-encoding']);
    }
  });

  it('compresses API JSON when the browser asks', async () => {
    // The sign-in answer is small; a list is long enough to be worth compressing, so sign in and ask for sites.
    const login = await fetch(`${baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'supervisor@example.test', password: 'isoledger-demo' }),
    });
    const { token } = (await login.json()) as { token: string };
    const res = await get('/api/assets?pageSize=200', { 'Accept-Encoding': 'gzip', Authorization: `Bearer ${token}` });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    const items = JSON.parse(zlib.gunzipSync(res.body).toString('utf8')) as { items: unknown[] };
    expect(items.items.length).toBeGreaterThan(0);
  });
});

describe('the scripts of the built web app', () => {
  const scripts = path.join(DIST, '_expo/static/js/web');

  it('defines every module a script requires in that script or in one index.html loads before it', () => {
    const eager = eagerScripts(DIST);
    expect(eager.map((f) => f.replace(/-[0-9a-f]+\.js$/, ''))).toEqual(['__expo-metro-runtime', '__common', 'entry']);
    expect(unmetRequirements(scripts, eager)).toEqual([]);
  });

  it('keeps each screen in a script of its own, fetched only when opened', () => {
    const eager = new Set(eagerScripts(DIST));
    const lazy = fs.readdirSync(scripts).filter((f) => f.endsWith('.js') && !eager.has(f));
    // The router's table of lazy routes in the entry script names each route's script.
    const entryCode = fs.readFileSync(path.join(scripts, [...eager].find((f) => f.startsWith('entry-'))!), 'utf8');
    const routeScripts = new Set(readScriptModules(entryCode).flatMap((m) => Object.values(m.loads).map((f) => path.basename(f))));
    expect(routeScripts.size).toBeGreaterThan(20);
    for (const f of routeScripts) expect(lazy).toContain(f);
    for (const name of ['sign-in', 'board', 'diagram', 'trend-chart', 'label-scanner', 'asset-readings-section']) {
      expect(lazy.some((f) => f.startsWith(`${name}-`))).toBe(true);
    }
  });
});
