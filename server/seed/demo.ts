import { QueryTypes, type Sequelize } from 'sequelize';
import type { Config } from '../config';
import type { Role } from '../../shared/roles';
import { User } from '../models';
import { hashPassword } from '../services/passwords';
import { recordAudit } from '../models/audit-event';
import { seedDemoScenario } from './demo-scenario';
import { randomBytes } from 'node:crypto';

/**
 * The demo scenario is invented: Halden Brook Materials, a mid-sized maker of
 * coatings, personal-care gels and battery slurries. No real company or person.
 */
export const DEMO_COMPANY = 'Halden Brook Materials';

export const DEMO_USERS: { role: Role; name: string; email: string; password: string }[] = [
  { role: 'admin', name: 'Ines Okafor-Lund', email: 'ines.admin@haldenbrook.example', password: 'demo-admin-pass' },
  { role: 'manager', name: 'Tomasz Rehn', email: 'tomasz.manager@haldenbrook.example', password: 'demo-manager-pass' },
  { role: 'formulator', name: 'Priya Castellanos', email: 'priya.formulator@haldenbrook.example', password: 'demo-formulator-pass' },
  { role: 'scientist', name: 'Jonah Achterberg', email: 'jonah.scientist@haldenbrook.example', password: 'demo-scientist-pass' },
  { role: 'viewer', name: 'Mei Lindqvist', email: 'mei.viewer@haldenbrook.example', password: 'demo-viewer-pass' },
];

/** Two more colleagues, so the bench log and recipes show more than one author. */
const DEMO_COLLEAGUES: { key: string; role: Role; name: string; email: string }[] = [
  { key: 'formulator2', role: 'formulator', name: 'Ruairi Vantongeren', email: 'ruairi.formulator@haldenbrook.example' },
  { key: 'scientist2', role: 'scientist', name: 'Sade Kowalczyk', email: 'sade.scientist@haldenbrook.example' },
];

const MARKER = 'demo_seeded_at';

/** Seeds the demo once; later runs find the marker and leave everything as the team left it. */
export async function seedDemoIfFirstRun(sequelize: Sequelize, config: Config): Promise<boolean> {
  const rows = await sequelize.query('SELECT value FROM app_meta WHERE name = ?', { replacements: [MARKER], type: QueryTypes.SELECT });
  if (rows.length > 0) return false;
  await sequelize.transaction(async (transaction) => {
    const people: Record<string, User> = {};
    for (const person of [...DEMO_USERS.map((u) => ({ ...u, key: u.role as string })), ...DEMO_COLLEAGUES.map((c) => ({ ...c, password: `demo-${c.key}-${randomBytes(6).toString('hex')}` }))]) {
      const user = await User.create(
        {
          email: person.email,
          name: person.name,
          role: person.role,
          passwordHash: await hashPassword(person.password, config.BCRYPT_COST),
          active: true,
          lastSignInAt: null,
          invitedBy: null,
        },
        { transaction },
      );
      await recordAudit({ actorId: null, action: 'user.seeded', entityType: 'user', entityId: user.id, details: { role: person.role } }, transaction);
      people[person.key] = user;
    }
    await seedDemoScenario(config, people, transaction);
    await sequelize.query('INSERT INTO app_meta (name, value, updated_at) VALUES (?, ?, NOW(3))', {
      replacements: [MARKER, new Date().toISOString()],
      transaction,
    });
  });
  return true;
}
