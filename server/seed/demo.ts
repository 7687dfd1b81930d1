import type { Sequelize } from 'sequelize';
import { Organisation } from '@/server/models/organisation.model';
import { User } from '@/server/models/user.model';
import { hashPassword } from '@/server/services/auth.service';
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

/** Seeds the demo organisation once; returns false when it was already there. */
export async function seedDemo(sequelize: Sequelize, opts: { bcryptCost?: number } = {}): Promise<boolean> {
  return sequelize.transaction(async (transaction) => {
    const existing = await Organisation.findOne({ where: { name: DEMO_ORGANISATION }, transaction, lock: transaction.LOCK.UPDATE });
    if (existing) return false;
    const organisation = await Organisation.create({ name: DEMO_ORGANISATION }, { transaction });
    const passwordHash = await hashPassword(DEMO_PASSWORD, opts.bcryptCost ?? 10);
    for (const u of DEMO_USERS) {
      await User.create({ ...u, organisationId: organisation.id, passwordHash }, { transaction });
    }
    return true;
  });
}
