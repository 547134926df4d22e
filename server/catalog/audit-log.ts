/** Every query on `audit_log`: who changed which catalog entry, when, from what to what. */
import type { Knex } from 'knex';

export interface AuditEntry {
  userId: number;
  entity: string;
  entityId: number;
  action: string;
  before: unknown;
  after: unknown;
}

export interface AuditRecord extends AuditEntry {
  id: number;
  createdAt: string;
}

const json = (value: unknown) => (value === undefined || value === null ? null : JSON.stringify(value));
const parsed = (value: unknown) => (typeof value === 'string' ? JSON.parse(value) : value);

export class AuditLog {
  constructor(private readonly db: Knex) {}

  async record(entry: AuditEntry, trx: Knex = this.db): Promise<void> {
    await trx('audit_log').insert({
      user_id: entry.userId,
      entity: entry.entity,
      entity_id: entry.entityId,
      action: entry.action,
      before: json(entry.before),
      after: json(entry.after),
    });
  }

  async forEntity(entity: string, entityId: number): Promise<AuditRecord[]> {
    const rows = await this.db('audit_log').where({ entity, entity_id: entityId }).orderBy('id');
    return rows.map((row) => ({
      id: Number(row.id),
      userId: row.user_id,
      entity: row.entity,
      entityId: row.entity_id,
      action: row.action,
      before: parsed(row.before),
      after: parsed(row.after),
      createdAt: new Date(row.created_at).toISOString(),
    }));
  }
}
