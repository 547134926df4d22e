/** Personal API tokens for scripts: named, scoped, shown once, stored hashed, revocable. */
import { Problem } from '../errors';
import { hashSecret, newSecret } from '../auth/secrets';
import type { Actor, TokenScope } from '../auth/principal';
import type { ApiToken, TokensRepository } from './tokens-repository';

/** Every API token starts with this, so the server tells it from a JWT without trying both. */
export const API_TOKEN_PREFIX = 'lwt_';
const SHOWN_PREFIX_LENGTH = 10;

export class PersonalTokens {
  constructor(private readonly tokens: TokensRepository) {}

  async create(actor: Actor, name: string, scope: TokenScope): Promise<{ token: ApiToken; secret: string }> {
    if (scope === 'read-write' && actor.role === 'viewer') {
      throw new Problem(403, 'Forbidden', 'A viewer can only create read tokens.', [{ field: 'scope', detail: 'must be read for a viewer' }]);
    }
    const secret = newSecret(API_TOKEN_PREFIX);
    const token = await this.tokens.insert({
      userId: actor.userId,
      name,
      scope,
      prefix: secret.slice(0, SHOWN_PREFIX_LENGTH),
      tokenHash: hashSecret(secret),
    });
    return { token, secret };
  }

  list(actor: Actor): Promise<ApiToken[]> {
    return this.tokens.listForUser(actor.userId);
  }

  async revoke(actor: Actor, id: number): Promise<void> {
    if (!(await this.tokens.revoke(actor.userId, id))) throw Problem.notFound('You have no live token with this id.');
  }

  /** The live token a script presents, marked as used; undefined when unknown or revoked. */
  async resolve(secret: string): Promise<ApiToken | undefined> {
    const token = await this.tokens.findLiveByHash(hashSecret(secret));
    if (token) await this.tokens.touch(token.id);
    return token;
  }
}
