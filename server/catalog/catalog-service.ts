/**
 * The rules every catalog (materials, conductors, line types) shares: who may
 * create, edit, move and delete entries, optimistic concurrency on every
 * write, and an audit row (before/after) in the same transaction as the
 * change. A feature supplies how its input is checked and stored (`prepare`),
 * what depends on an entry (`usage`) and any extra condition for a state.
 */
import type { Knex } from 'knex';
import { Problem } from '../errors';
import { hasRole, type Actor } from '../auth/principal';
import type { AuditLog } from './audit-log';
import type { CatalogRecord, CatalogRepository, ListQuery, Page } from './catalog-repository';
import { checkEditable, checkTransition, type CatalogState } from './catalog-states';

export const etagOf = (version: number) => `"${version}"`;

function staleVersion(current: CatalogRecord): Problem {
  return new Problem(
    409,
    'Conflict',
    `This entry was changed by someone else since you read it (it is now version ${current.version}); reload it and apply your change again.`,
    [],
    { ETag: etagOf(current.version) },
  );
}

/** What depends on an entry, e.g. the line types that use a material (injected, so features do not import each other's tables). */
export interface Dependents {
  /** Singular noun, e.g. 'line type'. */
  noun: string;
  count(id: number): Promise<number>;
}

export abstract class Catalog<R extends CatalogRecord, I, V> {
  constructor(
    protected readonly db: Knex,
    protected readonly records: CatalogRepository<R, V>,
    private readonly audit: AuditLog,
    /** Singular name for messages and the audit log, e.g. 'material'. */
    readonly entity: string,
    private readonly dependents?: Dependents | Dependents[],
  ) {}

  /** Checks a whole input (create) or a partial one (update, `existing` set) and converts it to stored SI values. */
  protected abstract prepare(input: Partial<I>, existing: R | undefined, actor: Actor): Promise<Partial<V>>;

  /** Describes what still uses the entry ("3 line types and 1 stackup"), or undefined when nothing does. */
  private async usage(record: R): Promise<string | undefined> {
    const parts: string[] = [];
    for (const dependent of [this.dependents ?? []].flat()) {
      const count = await dependent.count(record.id);
      if (count > 0) parts.push(`${count} ${dependent.noun}${count === 1 ? '' : 's'}`);
    }
    return parts.length > 0 ? parts.join(' and ') : undefined;
  }

  /** Any condition an entry must meet before it enters a state (e.g. its references approved). */
  protected async beforeTransition(_record: R, _to: CatalogState): Promise<void> {}

  /** The representation GET answers with. */
  async present(record: R): Promise<object> {
    return record;
  }

  list(query: ListQuery): Promise<Page<R>> {
    return this.records.list(query);
  }

  async get(id: number): Promise<R> {
    const record = await this.records.findById(id);
    if (!record) throw Problem.notFound(`No ${this.entity} with id ${id}.`);
    return record;
  }

  async create(actor: Actor, input: I): Promise<R> {
    if (!hasRole(actor.role, 'engineer')) throw Problem.forbidden('Adding to the catalog needs the engineer role or higher.');
    const values = await this.prepare(input, undefined, actor);
    return this.db.transaction((trx) => this.insertAudited(actor, values as V, trx, 'create'));
  }

  async update(actor: Actor, id: number, version: number, input: Partial<I>): Promise<R> {
    const before = await this.get(id);
    checkEditable(before.state, actor.role);
    if (before.version !== version) throw staleVersion(before);
    const values = await this.prepare(input, before, actor);
    return this.writeAudited(actor, before, version, values, 'update');
  }

  async transition(actor: Actor, id: number, version: number, to: CatalogState): Promise<R> {
    const before = await this.get(id);
    checkTransition(before.state, to, actor.role);
    if (before.version !== version) throw staleVersion(before);
    await this.beforeTransition(before, to);
    return this.writeAudited(actor, before, version, { state: to } as Partial<V> & { state: CatalogState }, `state:${to}`);
  }

  /** Deletes an entry nothing uses; anything in use must be retired instead. */
  async remove(actor: Actor, id: number, version: number): Promise<void> {
    const before = await this.get(id);
    const isOwnDraft = before.state === 'draft' && before.createdBy === actor.userId && hasRole(actor.role, 'engineer');
    if (!isOwnDraft && actor.role !== 'admin') throw Problem.forbidden('Engineers may delete only their own drafts; an admin deletes or retires the rest.');
    if (before.version !== version) throw staleVersion(before);
    const users = await this.usage(before);
    if (users) throw Problem.conflict(`This ${this.entity} is used by ${users}; retire it instead of deleting it.`);
    await this.db.transaction(async (trx) => {
      if (!(await this.records.deleteAtVersion(id, version, trx))) throw staleVersion((await this.records.findById(id, trx)) ?? before);
      await this.audit.record({ userId: actor.userId, entity: this.entity, entityId: id, action: 'delete', before, after: null }, trx);
    });
  }

  protected async insertAudited(actor: Actor, values: V, trx: Knex, action: string): Promise<R> {
    const id = await this.records.insert(values, actor.userId, trx);
    const after = (await this.records.findById(id, trx))!;
    await this.audit.record({ userId: actor.userId, entity: this.entity, entityId: id, action, before: null, after }, trx);
    return after;
  }

  private writeAudited(actor: Actor, before: R, version: number, changes: Partial<V> & { state?: CatalogState }, action: string): Promise<R> {
    return this.db.transaction(async (trx) => {
      // The conditional update is the real guard: the version check above only fails early.
      if (!(await this.records.updateAtVersion(before.id, version, changes, actor.userId, trx))) {
        throw staleVersion((await this.records.findById(before.id, trx)) ?? before);
      }
      const after = (await this.records.findById(before.id, trx))!;
      await this.audit.record({ userId: actor.userId, entity: this.entity, entityId: before.id, action, before, after }, trx);
      return after;
    });
  }
}
