import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLE_PERMISSION_NAMES, may, type RolePermission } from '@/shared/rules/permissions';
import { ROLES, type Role } from '@/shared/rules/roles';
import { createOrganisation, giveViewerEverySite, setupTestApp, tokenFor, type TestApp } from '@/test/setup/app';
import { apiRoutes, fillPath, type ApiRoute } from '@/test/server/support/api-routes';

// An id no record has: an allowed request gets past the permission check and then finds nothing (404) or a bad
// body (400/422), so walking every role changes no row; a refused one stops at 403.
const NONE = 987654;

let t: TestApp;
let guarded: ApiRoute[] = [];
const tokens = {} as Record<Role, string>;

beforeAll(async () => {
  t = await setupTestApp();
  const { users } = await createOrganisation('perm');
  await giveViewerEverySite(users.viewer);
  for (const role of ROLES) tokens[role] = await tokenFor(t.app, users[role]);
  guarded = apiRoutes(t.app).filter((r) => r.permission);
});
afterAll(() => t.close());

/** Where a check that guards no route is read instead: services, screens, mail, shared rules. */
const SOURCE_DIRS = ['server', 'shared', 'app', 'components', 'hooks'];
let source = '';
function sourceText(): string {
  if (source) return source;
  const parts: string[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const file = path.join(dir, name);
      if (statSync(file).isDirectory()) walk(file);
      else if (!/\.tsx?$/.test(name)) continue;
      // In the map's own file only what follows the map counts: the checks that look at the record.
      else if (file.endsWith(path.join('rules', 'permissions.ts'))) parts.push(readFileSync(file, 'utf8').split('export type RolePermission')[1]);
      else parts.push(readFileSync(file, 'utf8'));
    }
  };
  for (const dir of SOURCE_DIRS) walk(path.resolve(dir));
  return (source = parts.join('\n'));
}

async function answer(route: ApiRoute, role: Role) {
  const req = request(t.app)[route.method](fillPath(route.path, NONE)).set('Authorization', `Bearer ${tokens[role]}`);
  return route.method === 'get' ? req : req.send({});
}

describe('the permission map, walked check by check over the routes that use it', () => {
  it('finds the guarded routes in the app’s router', () => {
    expect(guarded.length).toBeGreaterThanOrEqual(25);
    expect(guarded.map((r) => `${r.method} ${r.path} ${r.permission}`)).toEqual(expect.arrayContaining([
      'get /api/board viewBoard', 'get /api/board.csv viewBoard', 'post /api/users/invite administerTeam', 'get /api/audit viewAudit',
      'post /api/tags/:id/reassign-in-absence superviseTags', 'post /api/sites manageSites',
    ]));
  });

  for (const permission of ROLE_PERMISSION_NAMES) {
    it(`${permission}: the roles the map names get past every route it guards, the others get 403`, async () => {
      const routes = guarded.filter((r) => r.permission === permission);
      if (!routes.length) {
        // A check no route uses is read by a service, a screen or the mail, never left unused.
        expect(sourceText().includes(`'${permission}'`), `${permission} is checked nowhere`).toBe(true);
        return;
      }
      for (const route of routes) {
        for (const role of ROLES) {
          const res = await answer(route, role);
          const seen = [route.method, route.path, role, res.status];
          // common practice, no published source: a refused role is told 403; an allowed one is never refused
          if (may({ role }, permission as RolePermission)) {
            expect(res.status, seen.join(' ')).not.toBe(403);
            expect(res.status, seen.join(' ')).toBeLessThan(500);
            // A list or a board with no id in its path answers the allowed role outright.
            if (route.method === 'get' && !route.path.includes(':')) expect(res.status, seen.join(' ')).toBe(200);
          } else {
            expect([...seen, res.body.error?.code]).toEqual([route.method, route.path, role, 403, 'forbidden']);
          }
        }
      }
    });
  }

  it('asks for a session before anything else (401)', async () => {
    for (const route of guarded) expect([route.path, (await request(t.app)[route.method](fillPath(route.path, NONE))).status]).toEqual([route.path, 401]);
  });
});
