/**
 * Sign-in, password change and password reset. Failures never reveal whether
 * an e-mail belongs to an account.
 */
import type { Knex } from 'knex';
import type { Config } from '../config';
import { Problem } from '../errors';
import type { Mailer } from '../mail/mail-transport';
import type { UnitPreferences, User, UsersRepository } from '../users/users-repository';
import type { AuthRepository } from './auth-repository';
import { hashPassword, isPasswordCorrect } from './passwords';
import { hashSecret, newSecret } from './secrets';
import { issueSessionToken } from './session-tokens';

const RESET_LIFETIME_MS = 60 * 60 * 1000;
const WRONG_SIGN_IN = 'The e-mail or the password is wrong.';

export interface SignedIn {
  user: User;
  token: string;
}

export class Accounts {
  constructor(
    private readonly db: Knex,
    private readonly config: Readonly<Config>,
    private readonly users: UsersRepository,
    private readonly resets: AuthRepository,
    private readonly mailer: Mailer,
  ) {}

  async signIn(email: string, password: string): Promise<SignedIn> {
    const user = await this.users.findWithSecretByEmail(email);
    const isCorrect = await isPasswordCorrect(password, user?.passwordHash);
    if (!user || !isCorrect || !user.isActive) throw Problem.unauthorized(WRONG_SIGN_IN);
    const { passwordHash: _hidden, ...plain } = user;
    return { user: plain, token: this.tokenFor(plain) };
  }

  /** A fresh sign-in token for a user, e.g. after a password change bumped the session version. */
  tokenFor(user: Pick<User, 'id' | 'sessionVersion'>): string {
    return issueSessionToken(this.config, user.id, user.sessionVersion);
  }

  async me(userId: number): Promise<User> {
    const user = await this.users.findById(userId);
    if (!user) throw Problem.unauthorized();
    return user;
  }

  async setPreferences(userId: number, preferences: UnitPreferences): Promise<User> {
    const user = await this.me(userId);
    await this.users.setPreferences(userId, { ...user.preferences, ...preferences });
    return this.me(userId);
  }

  async changePassword(userId: number, currentPassword: string, newPassword: string): Promise<SignedIn> {
    const user = await this.users.findWithSecretById(userId);
    if (!user || !(await isPasswordCorrect(currentPassword, user.passwordHash))) {
      throw Problem.badRequest('The current password is wrong.', [{ field: 'currentPassword', detail: 'is wrong' }]);
    }
    await this.db.transaction(async (trx) => {
      await this.users.setPassword(userId, await hashPassword(newPassword), trx);
      await this.resets.voidResetsOf(userId, trx);
    });
    const updated = await this.me(userId);
    return { user: updated, token: this.tokenFor(updated) };
  }

  /** Sends a one-time link when the e-mail belongs to an active account; silent otherwise. */
  async requestReset(email: string): Promise<void> {
    const user = await this.users.findWithSecretByEmail(email);
    if (!user?.isActive) return;
    const secret = newSecret();
    await this.resets.insertReset(user.id, hashSecret(secret), new Date(Date.now() + RESET_LIFETIME_MS));
    await this.mailer.send({
      to: user.email,
      subject: 'Reset your Linewright password',
      text: [
        `Someone asked to reset the password of ${user.email} on Linewright.`,
        `Choose a new password within an hour at:`,
        `${this.config.appUrl}/reset-password?token=${secret}`,
        '',
        'If it was not you, ignore this message; your password stays as it is.',
      ].join('\n'),
    });
  }

  async confirmReset(secret: string, newPassword: string): Promise<void> {
    const hash = await hashPassword(newPassword);
    const isDone = await this.db.transaction(async (trx) => {
      const userId = await this.resets.consumeReset(hashSecret(secret), trx);
      if (userId === undefined) return false;
      await this.users.setPassword(userId, hash, trx);
      await this.resets.voidResetsOf(userId, trx);
      return true;
    });
    if (!isDone) throw Problem.badRequest('This reset link is unknown, used or expired.', [{ field: 'token', detail: 'is unknown, used or expired' }]);
  }
}
