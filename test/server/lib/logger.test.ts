import { Writable } from 'node:stream';
import pino from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@/server/app';
import { redactUrl } from '@/server/lib/logger';
import { setupTestApp, type TestApp } from '@/test/setup/app';

let t: TestApp;
beforeAll(async () => { t = await setupTestApp(); });
afterAll(() => t.close());

/** A logger whose every line is kept, to read what the server would have written. */
function capturingLogger() {
  const lines: string[] = [];
  const stream = new Writable({ write(chunk, _enc, done) { lines.push(String(chunk)); done(); } });
  return { log: pino({ level: 'info' }, stream), lines };
}

describe('request log', () => {
  it('never writes a one-time token from a set-password link, and still logs the request', async () => {
    const { log, lines } = capturingLogger();
    const app = createApp({ sequelize: t.db.sequelize, config: t.config, requestLog: log });
    const token = 'S3cretOneTimeToken_abcdefghijklmnopqrstuvwxyz012345';
    await request(app).get(`/set-password?token=${token}`);
    await request(app).get(`/api/me?x=1&token=${token}&y=2`);
    await request(app).post('/api/auth/password/set').send({ token, password: 'a-new-password-1' });
    const text = lines.join('');
    expect(lines.length).toBeGreaterThanOrEqual(3);
    expect(text).toContain('/set-password?token=[redacted]');
    expect(text).toContain('/api/me?x=1&token=[redacted]&y=2');
    expect(text).not.toContain(token);
  });
});

describe('redactUrl', () => {
  it('replaces token-like query values and leaves the rest of the URL', () => {
    expect(redactUrl('/set-password?token=abc')).toBe('/set-password?token=[redacted]');
    expect(redactUrl('/x?TOKEN=abc&page=2')).toBe('/x?TOKEN=[redacted]&page=2');
    expect(redactUrl('/api/tags?assetId=4')).toBe('/api/tags?assetId=4');
  });
});
