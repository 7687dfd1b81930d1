import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import bcrypt from 'bcryptjs';
import request from 'supertest';
import { createApp } from '@/server/app';
import { readConfig, type ServerConfig } from '@/server/config';
import { Organisation } from '@/server/models/organisation.model';
import { Site } from '@/server/models/site.model';
import { UserSiteAccess } from '@/server/models/user-site-access.model';
import { User } from '@/server/models/user.model';
import type { Role } from '@/shared/rules/roles';
import { createTestDatabase, type TestDatabase } from '@/test/setup/db';

export const TEST_PASSWORD = 'correct-horse-battery';
export const TEST_JWT_SECRET = 'test-secret-for-isoledger-api-tests';

export interface TestApp {
  app: ReturnType<typeof createApp>;
  db: TestDatabase;
  config: ServerConfig;
  close: () => Promise<void>;
}

export async function setupTestApp(overrides: Partial<ServerConfig> = {}): Promise<TestApp> {
  const db = await createTestDatabase();
  // A data folder of its own (stored photos), removed with the database.
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'isoledger-test-data-'));
  const config = readConfig({}, { jwtSecret: TEST_JWT_SECRET, webDir: null, bcryptCost: 10, dataDir, ...overrides });
  const app = createApp({ sequelize: db.sequelize, config });
  const close = async () => {
    await db.drop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
  return { app, db, config, close };
}

let cachedHash: string | null = null;

export type OrgUsers = Record<'admin' | 'supervisor' | 'engineer' | 'engineer2' | 'viewer', User>;

/** An organisation with one user of each role; e-mails are prefixed so several organisations can coexist. */
export async function createOrganisation(prefix: string): Promise<{ organisation: Organisation; users: OrgUsers }> {
  cachedHash ??= await bcrypt.hash(TEST_PASSWORD, 10);
  const organisation = await Organisation.create({ name: `${prefix} Test Services` });
  const make = (key: string, role: Role) =>
    User.create({ organisationId: organisation.id, name: `${prefix} ${key}`, email: `${key}@${prefix}.test`, role, passwordHash: cachedHash });
  const users = {
    admin: await make('admin', 'admin'),
    supervisor: await make('supervisor', 'supervisor'),
    engineer: await make('engineer', 'engineer'),
    engineer2: await make('engineer2', 'engineer'),
    viewer: await make('viewer', 'viewer'),
  };
  return { organisation, users };
}

export async function tokenFor(app: TestApp['app'], user: User): Promise<string> {
  const res = await request(app).post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in failed for ${user.email}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.token as string;
}

/**
 * Gives a viewer every site their organisation has at this moment (a viewer sees only the sites given to them),
 * for tests where the viewer stands for any reader. Sites created later need another call.
 */
export async function giveViewerEverySite(viewer: User): Promise<void> {
  const sites = await Site.findAll({ attributes: ['id'], where: { organisationId: viewer.organisationId } });
  await UserSiteAccess.bulkCreate(sites.map((s) => ({ userId: viewer.id, siteId: s.id, grantedBy: null })), { ignoreDuplicates: true });
}
