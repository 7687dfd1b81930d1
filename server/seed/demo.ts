import type { Sequelize } from 'sequelize';
import { Site } from '@/server/models/site.model';
import { UserSiteAccess } from '@/server/models/user-site-access.model';
import { Organisation } from '@/server/models/organisation.model';
import { User } from '@/server/models/user.model';
import { hashPassword } from '@/server/lib/passwords';
import { readConfig } from '@/server/config';
import { createPhotoStorage } from '@/server/lib/create-photo-storage';
import type { PhotoStorage } from '@/server/lib/photo-storage';
import { seedDemoRegister } from '@/server/seed/demo-register';
import { seedDemoConnections } from '@/server/seed/demo-connections';
import { seedDemoReadings } from '@/server/seed/demo-readings';
import { seedDemoTags } from '@/server/seed/demo-tags';
import type { Role } from '@/shared/rules/roles';

export const DEMO_PASSWORD = 'isoledger-demo';
export const DEMO_ORGANISATION = 'Halyard Vale Mechanical (demo)';

// Invented people for the demo only.
export const DEMO_USERS: { email: string; name: string; role: Role; phone: string }[] = [
  { email: 'admin@example.test', name: 'Ada Brennick', role: 'admin', phone: '+44 7700 900101' },
  { email: 'supervisor@example.test', name: 'Tomasz Yeardley', role: 'supervisor', phone: '+44 7700 900102' },
  { email: 'engineer@example.test', name: 'Kofi Marchetti', role: 'engineer', phone: '+44 7700 900103' },
  { email: 'engineer2@example.test', name: 'Rhian Castellane', role: 'engineer', phone: '+44 7700 900104' },
  { email: 'viewer@example.test', name: 'Odile Penhaligon', role: 'viewer', phone: '+44 7700 900105' },
];

/**
 * Seeds the demo organisation once; returns false when it was already there. The demo register (sites,
 * plant rooms, items, photos) is seeded with it, or on its own into an organisation seeded before the
 * register existed. Photos go to `opts.storage`, by default the storage configured by the environment.
 */
export async function seedDemo(sequelize: Sequelize, opts: { bcryptCost?: number; storage?: PhotoStorage } = {}): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const storage = opts.storage ?? createPhotoStorage(readConfig());
    const register = async (organisationId: number) => {
      const users = await User.findAll({ where: { organisationId }, transaction });
      const byEmail = (email: string) => users.find((u) => u.email === email)!;
      const authors = { supervisor: byEmail('supervisor@example.test'), engineer: byEmail('engineer@example.test'), engineer2: byEmail('engineer2@example.test') };
      if (!authors.supervisor || !authors.engineer || !authors.engineer2) return false;
      const seeded = await seedDemoRegister({ organisationId, authors, storage, transaction });
      if (seeded) await seedDemoConnections({ organisationId, createdBy: authors.supervisor.id, transaction });
      await seedDemoReadings({ organisationId, authors, transaction });
      if (seeded) await seedDemoTags({ organisationId, engineer: authors.engineer, engineer2: authors.engineer2, supervisor: authors.supervisor, transaction });
      const viewer = users.find((u) => u.email === 'viewer@example.test');
      if (seeded && viewer) {
        // The demo viewer (a client's facilities manager, say) is given two of the three sites.
        const sites = await Site.findAll({ where: { organisationId }, order: [['name', 'ASC']], transaction });
        const grantedBy = users.find((u) => u.email === 'admin@example.test')?.id ?? null;
        await UserSiteAccess.bulkCreate(sites.slice(0, 2).map((site) => ({ userId: viewer.id, siteId: site.id, grantedBy })), { transaction });
      }
      return seeded;
    };
    const existing = await Organisation.findOne({ where: { name: DEMO_ORGANISATION }, transaction, lock: transaction.LOCK.UPDATE });
    if (existing) return register(existing.id);
    const organisation = await Organisation.create({ name: DEMO_ORGANISATION }, { transaction });
    const passwordHash = await hashPassword(DEMO_PASSWORD, opts.bcryptCost ?? 10);
    for (const u of DEMO_USERS) {
      await User.create({ ...u, organisationId: organisation.id, passwordHash }, { transaction });
    }
    await register(organisation.id);
    return true;
  });
}
