/** Every query on the `password_resets` table. Links are stored as SHA-256 hashes only. */
import type { Knex } from 'knex';

export class AuthRepository {
  constructor(private readonly db: Knex) {}

  async insertReset(userId: number, tokenHash: string, expiresAt: Date): Promise<void> {
    await this.db('password_resets').insert({ user_id: userId, token_hash: tokenHash, expires_at: expiresAt });
  }

  /**
   * Marks the reset used and returns its user, in one conditional update so two
   * requests racing with one link cannot both succeed.
   */
  async consumeReset(tokenHash: string, trx: Knex): Promise<number | undefined> {
    const row = await trx('password_resets')
      .where({ token_hash: tokenHash })
      .whereNull('used_at')
      .where('expires_at', '>', trx.fn.now())
      .first('id', 'user_id');
    if (!row) return undefined;
    const changed = await trx('password_resets').where({ id: row.id }).whereNull('used_at').update({ used_at: trx.fn.now() });
    return changed === 1 ? (row.user_id as number) : undefined;
  }

  /** A new password makes every older link of the same user useless. */
  async voidResetsOf(userId: number, trx: Knex): Promise<void> {
    await trx('password_resets').where({ user_id: userId }).whereNull('used_at').update({ used_at: trx.fn.now() });
  }
}
