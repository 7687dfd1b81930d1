import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { may, type RolePermission } from '@/shared/rules/permissions';
import { ROLES, type Role } from '@/shared/rules/roles';
import { createOrganisation, setupTestApp, tokenFor, type TestApp } from '@/test/setup/app';

// Ids no record has: an allowed request gets past the permission check and then finds nothing (404) or a bad
// body (422), so walking every role changes no row; a refused one stops at 403.
const NONE = 987654;

/** Each route guarded by a named permission, with a request that changes nothing when allowed. */
const GUARDED: { permission: RolePermission; method: 'get' | 'post' | 'patch' | 'put'; path: string; body?: object }[] = [
  { permission: 'manageSites', method: 'post', path: '/api/sites', body: {} },
  { permission: 'manageSites', method: 'patch', path: `/api/sites/${NONE}`, body: { name: 'Renamed' } },
  { permission: 'addToRegister', method: 'post', path: '/api/plant-rooms', body: {} },
  { permission: 'addToRegister', method: 'patch', path: `/api/plant-rooms/${NONE}`, body: { name: 'Renamed' } },
  { permission: 'addToRegister', method: 'post', path: '/api/assets', body: {} },
  { permission: 'addToRegister', method: 'patch', path: `/api/assets/${NONE}`, body: { name: 'Renamed' } },
  { permission: 'archiveRecords', method: 'post', path: `/api/assets/${NONE}/archive` },
  { permission: 'addToRegister', method: 'post', path: '/api/connections', body: {} },
  { permission: 'importRegister', method: 'post', path: '/api/connections/import' },
  { permission: 'importRegister', method: 'post', path: '/api/assets/import' },
  { permission: 'replaceLabel', method: 'post', path: `/api/assets/${NONE}/label/replace` },
  { permission: 'recordReadings', method: 'post', path: `/api/assets/${NONE}/readings`, body: {} },
  { permission: 'recordReadings', method: 'put', path: `/api/sites/${NONE}/systems/LTHW`, body: {} },
  { permission: 'viewBoard', method: 'get', path: '/api/board' },
  { permission: 'viewBoard', method: 'get', path: '/api/board.csv' },
  { permission: 'listPeople', method: 'get', path: '/api/users' },
  { permission: 'listPeople', method: 'get', path: `/api/users/${NONE}` },
  { permission: 'viewAudit', method: 'get', path: '/api/audit' },
  { permission: 'administerTeam', method: 'post', path: '/api/users/invite', body: {} },
  { permission: 'administerTeam', method: 'patch', path: `/api/users/${NONE}`, body: { active: false } },
  { permission: 'administerTeam', method: 'put', path: `/api/users/${NONE}/sites`, body: { siteIds: [] } },
  { permission: 'administerTeam', method: 'post', path: `/api/users/${NONE}/invite` },
];

let t: TestApp;
const tokens = {} as Record<Role, string>;

beforeAll(async () => {
  t = await setupTestApp();
  const { users } = await createOrganisation('perm');
  for (const role of ROLES) tokens[role] = await tokenFor(t.app, users[role]);
});
afterAll(() => t.close());

describe('routes guarded by the permission map', () => {
  for (const { permission, method, path, body } of GUARDED) {
    it(`${method.toUpperCase()} ${path} follows ${permission} for every role`, async () => {
      for (const role of ROLES) {
        const req = request(t.app)[method](path).set('Authorization', `Bearer ${tokens[role]}`);
        const res = body ? await req.send(body) : await req;
        // common practice, no published source: a refused role is told 403; an allowed one is never refused
        if (may({ role }, permission)) {
          expect([res.status, role]).not.toEqual([403, role]);
          expect(res.status).toBeLessThan(500);
        } else {
          expect([res.status, res.body.error?.code, role]).toEqual([403, 'forbidden', role]);
        }
      }
    });
  }

  it('asks for a session before anything else (401)', async () => {
    for (const { method, path } of GUARDED) expect((await request(t.app)[method](path)).status).toBe(401);
  });
});
