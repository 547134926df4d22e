/**
 * The one Knex repository behind materials, conductors and line types: list
 * with filter, sort and pagination; get; insert; the optimistic-concurrency
 * update (`where version = ?`, then version + 1); delete. Each feature
 * describes its table once in a CatalogTable.
 */
import type { Knex } from 'knex';
import { Problem } from '../errors';
import type { CatalogState } from './catalog-states';

/** The columns every catalog table has (migrations: catalogColumns). */
export interface CatalogRecord {
  id: number;
  name: string;
  state: CatalogState;
  version: number;
  createdBy: number | null;
  updatedBy: number | null;
  createdAt: string;
  updatedAt: string;
}

export type Row = Record<string, unknown>;

export interface CatalogTable<R extends CatalogRecord, V> {
  table: string;
  /** The feature's own fields of a row, camelCase, JSON parsed. */
  fromRow(row: Row): Omit<R, keyof CatalogRecord>;
  /** Stored values (SI) to columns; only the keys present. */
  toRow(values: Partial<V>): Row;
  /** API sort key → column. */
  sortColumns: Record<string, string>;
  /** API filter name → condition; `state` and `q` (name/description contains) are common to all. */
  filters?: Record<string, (query: Knex.QueryBuilder, value: string) => void>;
}

export interface ListQuery {
  page: number;
  pageSize: number;
  /** A sort key, `-` first for descending, e.g. `-updatedAt`. */
  sort?: string;
  q?: string;
  state?: CatalogState;
  filters: Record<string, string>;
}

export interface Page<R> {
  items: R[];
  total: number;
  page: number;
  pageSize: number;
}

/** MariaDB's duplicate-key error: the only unique key a catalog table has beside its id is the name. */
const DUPLICATE_KEY = 'ER_DUP_ENTRY';

const iso = (value: unknown) => new Date(value as string).toISOString();

/** `%` and `_` in a search are literal text, not wildcards. */
const likeLiteral = (text: string) => `%${text.replace(/[\\%_]/g, (character) => `\\${character}`)}%`;

export class CatalogRepository<R extends CatalogRecord, V> {
  constructor(
    private readonly db: Knex,
    private readonly spec: CatalogTable<R, V>,
  ) {}

  get table(): string {
    return this.spec.table;
  }

  toRecord(row: Row): R {
    return {
      id: row['id'],
      name: row['name'],
      state: row['state'],
      version: row['version'],
      createdBy: row['created_by'],
      updatedBy: row['updated_by'],
      createdAt: iso(row['created_at']),
      updatedAt: iso(row['updated_at']),
      ...this.spec.fromRow(row),
    } as R;
  }

  async list(query: ListQuery): Promise<Page<R>> {
    const filtered = this.db(this.spec.table).where((builder) => {
      if (query.state) builder.where('state', query.state);
      // Plain LIKE: knex's whereLike adds a utf8_bin collation MariaDB refuses on utf8mb4 columns.
      if (query.q) builder.where((text) => text.where('name', 'like', likeLiteral(query.q!)).orWhere('description', 'like', likeLiteral(query.q!)));
      for (const [name, value] of Object.entries(query.filters)) this.spec.filters?.[name]?.(builder, value);
    });
    const [{ total }] = await filtered.clone().count({ total: '*' });
    const descending = query.sort?.startsWith('-') ?? false;
    const column = this.spec.sortColumns[query.sort?.replace(/^-/, '') ?? 'name'] ?? 'name';
    const rows = await filtered
      .clone()
      .orderBy([{ column, order: descending ? 'desc' : 'asc' }, { column: 'id', order: 'asc' }])
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize);
    return { items: rows.map((row: Row) => this.toRecord(row)), total: Number(total), page: query.page, pageSize: query.pageSize };
  }

  async findById(id: number, trx: Knex = this.db): Promise<R | undefined> {
    const row = await trx(this.spec.table).where({ id }).first();
    return row ? this.toRecord(row) : undefined;
  }

  async findByIds(ids: number[]): Promise<R[]> {
    if (ids.length === 0) return [];
    const rows = await this.db(this.spec.table).whereIn('id', ids);
    return rows.map((row: Row) => this.toRecord(row));
  }

  async insert(values: V, userId: number, trx: Knex = this.db): Promise<number> {
    return this.uniquely(async () => {
      const [id] = await trx(this.spec.table).insert({ ...this.spec.toRow(values), state: 'draft', version: 1, created_by: userId, updated_by: userId });
      return id as number;
    });
  }

  /**
   * Applies changes only if the row is still at `version`; false when someone
   * else changed it first (the caller answers 409 and nothing is written).
   */
  async updateAtVersion(id: number, version: number, changes: Partial<V> & { state?: CatalogState }, userId: number, trx: Knex = this.db): Promise<boolean> {
    const { state, ...values } = changes;
    return this.uniquely(async () => {
      const changed = await trx(this.spec.table)
        .where({ id, version })
        .update({
          ...this.spec.toRow(values as Partial<V>),
          ...(state ? { state } : {}),
          version: trx.raw('version + 1'),
          updated_by: userId,
          updated_at: trx.fn.now(),
        });
      return changed === 1;
    });
  }

  async deleteAtVersion(id: number, version: number, trx: Knex = this.db): Promise<boolean> {
    return (await trx(this.spec.table).where({ id, version }).delete()) === 1;
  }

  async count(): Promise<number> {
    const [{ total }] = await this.db(this.spec.table).count({ total: '*' });
    return Number(total);
  }

  /** Turns a duplicate name into a 409 naming the field instead of a bare 500. */
  private async uniquely<T>(write: () => Promise<T>): Promise<T> {
    try {
      return await write();
    } catch (error) {
      if ((error as { code?: string }).code === DUPLICATE_KEY) {
        throw new Problem(409, 'Conflict', 'Another entry already has this name.', [{ field: 'name', detail: 'is already used' }]);
      }
      throw error;
    }
  }
}
