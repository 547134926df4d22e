/** Every query on the `api_tokens` table. Secrets are never stored, only their SHA-256. */
import type { Knex } from 'knex';
import type { TokenScope } from '../auth/principal';

export interface ApiToken {
  id: number;
  userId: number;
  name: string;
  scope: TokenScope;
  /** The first characters of the secret, so a user can tell tokens apart. */
  prefix: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
  createdAt: string;
}

interface TokenRow {
  id: number;
  user_id: number;
  name: string;
  scope: TokenScope;
  prefix: string;
  last_used_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
}

const iso = (value: Date | null) => (value ? new Date(value).toISOString() : null);

function toToken(row: TokenRow): ApiToken {
  return {
    id: row.id,
    userId: row.user_id,
    name: row.name,
    scope: row.scope,
    prefix: row.prefix,
    lastUsedAt: iso(row.last_used_at),
    revokedAt: iso(row.revoked_at),
    createdAt: iso(row.created_at)!,
  };
}

export class TokensRepository {
  constructor(private readonly db: Knex) {}

  async insert(token: { userId: number; name: string; scope: TokenScope; prefix: string; tokenHash: string }): Promise<ApiToken> {
    const [id] = await this.db('api_tokens').insert({
      user_id: token.userId,
      name: token.name,
      scope: token.scope,
      prefix: token.prefix,
      token_hash: token.tokenHash,
    });
    return toToken((await this.db<TokenRow>('api_tokens').where({ id }).first())!);
  }

  async listForUser(userId: number): Promise<ApiToken[]> {
    const rows = await this.db<TokenRow>('api_tokens').where({ user_id: userId }).orderBy('id', 'desc');
    return rows.map(toToken);
  }

  /** The live (not revoked) token with this hash, if any. */
  async findLiveByHash(tokenHash: string): Promise<ApiToken | undefined> {
    const row: TokenRow | undefined = await this.db('api_tokens').where({ token_hash: tokenHash }).whereNull('revoked_at').first();
    return row ? toToken(row) : undefined;
  }

  async touch(id: number): Promise<void> {
    await this.db('api_tokens').where({ id }).update({ last_used_at: this.db.fn.now() });
  }

  /** Revokes one of the user's tokens; false when the user has no such live token. */
  async revoke(userId: number, id: number): Promise<boolean> {
    const changed = await this.db('api_tokens').where({ id, user_id: userId }).whereNull('revoked_at').update({ revoked_at: this.db.fn.now() });
    return changed > 0;
  }
}
