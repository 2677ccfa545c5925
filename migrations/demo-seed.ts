import type { Sequelize } from 'sequelize';
import { Bridge, GeometryRevision, User } from '@/models';
import { hashPassword } from '@/lib/auth/password';
import type { Role } from '@/lib/auth/roles';
import { demoBridges } from '@/lib/demo/bridges';
import { audit } from '@/lib/services/audit';
import { seedDemoHistory } from './demo-history';

/** Shared password of the demo accounts; the README tells every installation to change it. */
export const DEMO_PASSWORD = 'chordline-demo';

export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@example.com', name: 'Dana Admin', role: 'admin' },
  { email: 'engineer@example.com', name: 'Eli Engineer', role: 'engineer' },
  { email: 'inspector@example.com', name: 'Ines Inspector', role: 'inspector' },
  { email: 'crew@example.com', name: 'Cal Crew', role: 'crew' },
];

/**
 * Fills an empty database with the demo accounts, the invented demo bridges and their invented field
 * history (migrations/demo-history.ts). Does nothing when
 * any user exists, so it never touches a database in use.
 */
export async function seedDemo(sequelize: Sequelize): Promise<boolean> {
  if ((await User.count()) > 0) return false;
  const hash = await hashPassword(DEMO_PASSWORD);
  await sequelize.transaction(async (transaction) => {
    const users = await Promise.all(DEMO_ACCOUNTS.map((a) => User.create({ ...a, passwordHash: hash }, { transaction })));
    const engineer = users.find((u) => u.role === 'engineer')!;
    const inspector = users.find((u) => u.role === 'inspector')!;
    const made: { bridge: Bridge; description: (typeof demoBridges)[number] }[] = [];
    for (const description of demoBridges) {
      const bridge = await Bridge.create({ name: description.name, units: description.units, currentRevision: 1 }, { transaction });
      await GeometryRevision.create({ bridgeId: bridge.id, revision: 1, description: JSON.stringify(description), authorId: engineer.id, note: 'Demo bridge' }, { transaction });
      await audit(engineer.id, 'bridge.create', 'bridge', bridge.id, { name: bridge.name, demo: true }, transaction);
      made.push({ bridge, description });
    }
    await seedDemoHistory(made, inspector.id, transaction);
  });
  return true;
}
