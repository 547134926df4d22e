/**
 * The invented demo team: Halden Ridge Instruments, a small maker of field data
 * loggers. Passwords are for local use only and are listed in the README.
 * Re-runnable: rows are matched by e-mail and never duplicated or overwritten.
 */
import type { Knex } from 'knex';
import bcrypt from 'bcryptjs';

export const DEMO_USERS = [
  { email: 'admin@halden.test', name: 'Ada Halvorsen (demo admin)', role: 'admin', password: 'halden-admin-1' },
  { email: 'engineer@halden.test', name: 'Eirik Brandt (demo engineer)', role: 'engineer', password: 'halden-engineer-1' },
  { email: 'viewer@halden.test', name: 'Vera Lind (demo viewer)', role: 'viewer', password: 'halden-viewer-1' },
] as const;

export async function seed(knex: Knex): Promise<void> {
  for (const user of DEMO_USERS) {
    const existing = await knex('users').where({ email: user.email }).first();
    if (existing) continue;
    await knex('users').insert({
      email: user.email,
      name: user.name,
      role: user.role,
      password_hash: await bcrypt.hash(user.password, 10),
      preferences: JSON.stringify({ lengthUnit: 'mm' }),
    });
  }
}
