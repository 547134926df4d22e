/** Every query on the `users` table. */
import type { Knex } from 'knex';

export const ROLES = ['viewer', 'engineer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export interface UnitPreferences {
  lengthUnit?: string;
  thicknessUnit?: string;
  frequencyUnit?: string;
}

export interface User {
  id: number;
  email: string;
  name: string;
  role: Role;
  preferences: UnitPreferences;
  isActive: boolean;
  sessionVersion: number;
  createdAt: string;
}

/** A user row with its password hash, for sign-in only; never leaves the service layer. */
export interface UserWithSecret extends User {
  passwordHash: string | null;
}

interface UserRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  preferences: string | UnitPreferences | null;
  is_active: number | boolean;
  session_version: number;
  created_at: Date;
  password_hash: string | null;
}

function toUser(row: UserRow): UserWithSecret {
  const preferences = typeof row.preferences === 'string' ? JSON.parse(row.preferences) : (row.preferences ?? {});
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    preferences,
    isActive: Boolean(row.is_active),
    sessionVersion: row.session_version,
    createdAt: new Date(row.created_at).toISOString(),
    passwordHash: row.password_hash,
  };
}

function withoutSecret({ passwordHash: _hidden, ...user }: UserWithSecret): User {
  return user;
}

export class UsersRepository {
  constructor(private readonly db: Knex) {}

  async findById(id: number): Promise<User | undefined> {
    const row = await this.db<UserRow>('users').where({ id }).first();
    return row ? withoutSecret(toUser(row)) : undefined;
  }

  async findWithSecretByEmail(email: string): Promise<UserWithSecret | undefined> {
    const row = await this.db<UserRow>('users').where({ email: email.toLowerCase() }).first();
    return row ? toUser(row) : undefined;
  }

  async findWithSecretById(id: number): Promise<UserWithSecret | undefined> {
    const row = await this.db<UserRow>('users').where({ id }).first();
    return row ? toUser(row) : undefined;
  }

  async list(): Promise<User[]> {
    const rows = await this.db<UserRow>('users').orderBy('email');
    return rows.map((row) => withoutSecret(toUser(row)));
  }

  async insert(user: { email: string; name: string; role: Role; passwordHash: string }, trx: Knex = this.db): Promise<number> {
    const [id] = await trx('users').insert({
      email: user.email.toLowerCase(),
      name: user.name,
      role: user.role,
      password_hash: user.passwordHash,
      preferences: JSON.stringify({}),
    });
    return id;
  }

  async update(id: number, changes: { role?: Role; isActive?: boolean; name?: string }): Promise<void> {
    const row: Record<string, unknown> = { updated_at: this.db.fn.now() };
    if (changes.role !== undefined) row['role'] = changes.role;
    if (changes.isActive !== undefined) row['is_active'] = changes.isActive;
    if (changes.name !== undefined) row['name'] = changes.name;
    await this.db('users').where({ id }).update(row);
  }

  async setPreferences(id: number, preferences: UnitPreferences): Promise<void> {
    await this.db('users').where({ id }).update({ preferences: JSON.stringify(preferences), updated_at: this.db.fn.now() });
  }

  /** Sets a new password hash and invalidates every sign-in token issued before. */
  async setPassword(id: number, passwordHash: string, trx: Knex = this.db): Promise<void> {
    await trx('users')
      .where({ id })
      .update({ password_hash: passwordHash, session_version: trx.raw('session_version + 1'), updated_at: trx.fn.now() });
  }

  async countActiveAdmins(): Promise<number> {
    const [{ count }] = await this.db('users').where({ role: 'admin', is_active: true }).count({ count: '*' });
    return Number(count);
  }
}
