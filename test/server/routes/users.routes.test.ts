import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '@/server/models/audit-event.model';
import { createOrganisation, setupTestApp, tokenFor, type OrgUsers, type TestApp } from '@/test/setup/app';

let t: TestApp;
let alder: OrgUsers;
let birch: OrgUsers;
const tokens: Partial<Record<keyof OrgUsers, string>> = {};

beforeAll(async () => {
  t = await setupTestApp();
  alder = (await createOrganisation('alder')).users;
  birch = (await createOrganisation('birch')).users;
  for (const role of ['admin', 'supervisor', 'engineer', 'viewer'] as const) tokens[role] = await tokenFor(t.app, alder[role]);
});
afterAll(() => t.close());

const get = (path: string, role: keyof OrgUsers) => request(t.app).get(path).set('Authorization', `Bearer ${tokens[role]}`);

describe('role checks', () => {
  it.each([
    ['/api/users', 'admin', 200],
    ['/api/users', 'supervisor', 200],
    ['/api/users', 'engineer', 403],
    ['/api/users', 'viewer', 403],
    ['/api/audit', 'admin', 200],
    ['/api/audit', 'supervisor', 403],
    ['/api/audit', 'engineer', 403],
    ['/api/audit', 'viewer', 403],
    ['/api/me', 'viewer', 200],
  ] as const)('GET %s as %s → %i', async (path, role, status) => {
    const res = await get(path, role);
    expect(res.status).toBe(status);
    if (status === 403) expect(res.body.error.code).toBe('forbidden');
  });
});

describe('GET /api/users', () => {
  it('lists only the caller’s organisation in the list format', async () => {
    const res = await get('/api/users?pageSize=2&page=2', 'supervisor');
    expect(res.body).toMatchObject({ total: 5, page: 2, pageSize: 2 });
    expect(res.body.items).toHaveLength(2);
    const all = await get('/api/users?pageSize=1000', 'admin');
    expect(all.body.pageSize).toBe(200);
    expect(all.body.items.map((u: { email: string }) => u.email).every((e: string) => e.endsWith('@alder.test'))).toBe(true);
  });

  it('answers 404 for a user of another organisation, the same as for a missing one', async () => {
    const foreign = await get(`/api/users/${birch.engineer.id}`, 'admin');
    const missing = await get('/api/users/999999', 'admin');
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual(missing.body);
    expect((await get(`/api/users/${alder.engineer.id}`, 'admin')).body.email).toBe('engineer@alder.test');
  });
});

describe('audit log', () => {
  it('shows the organisation’s sign-ins to the admin and refuses edits in the database', async () => {
    const res = await get('/api/audit', 'admin');
    expect(res.body.items.some((e: { type: string; userId: number }) => e.type === 'sign-in' && e.userId === alder.viewer.id)).toBe(true);
    expect(res.body.items.some((e: { userId: number }) => e.userId === birch.admin.id)).toBe(false);
    await expect(t.db.rootQuery('UPDATE audit_events SET type = ? WHERE id > 0', ['edited'])).rejects.toThrow(/append-only/);
    await expect(t.db.rootQuery('DELETE FROM audit_events')).rejects.toThrow(/append-only/);
    expect(await AuditEvent.count({ where: { type: 'edited' } })).toBe(0);
  });
});
