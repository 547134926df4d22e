/** An admin invites by e-mail; the invitee follows the one-time link and sets a name and password. */
import type { Knex } from 'knex';
import type { Config } from '../config';
import { Problem } from '../errors';
import type { Actor } from '../auth/principal';
import { hashPassword } from '../auth/passwords';
import { hashSecret, newSecret } from '../auth/secrets';
import type { Mailer } from '../mail/mail-transport';
import type { Role, User, UsersRepository } from '../users/users-repository';
import type { Invitation, InvitationsRepository } from './invitations-repository';

const INVITATION_LIFETIME_MS = 7 * 24 * 3600 * 1000;

export class Invitations {
  constructor(
    private readonly db: Knex,
    private readonly config: Readonly<Config>,
    private readonly invitations: InvitationsRepository,
    private readonly users: UsersRepository,
    private readonly mailer: Mailer,
  ) {}

  async invite(actor: Actor, email: string, role: Role): Promise<Invitation> {
    if (await this.users.findWithSecretByEmail(email)) {
      throw Problem.conflict('An account with this e-mail already exists.');
    }
    const secret = newSecret();
    const invitation = await this.invitations.insert({
      email,
      role,
      invitedBy: actor.userId,
      tokenHash: hashSecret(secret),
      expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS),
    });
    await this.mailer.send({
      to: invitation.email,
      subject: 'You are invited to Linewright',
      text: [
        `You are invited to join your team's Linewright workspace as ${role}.`,
        'Choose your name and password within seven days at:',
        `${this.config.appUrl}/accept-invitation?token=${secret}`,
      ].join('\n'),
    });
    return invitation;
  }

  listOpen(): Promise<Invitation[]> {
    return this.invitations.listOpen();
  }

  async revoke(id: number): Promise<void> {
    if (!(await this.invitations.revoke(id))) throw Problem.notFound('No open invitation with this id.');
  }

  /** Creates the account the invitation names; the link works once. */
  async accept(secret: string, name: string, password: string): Promise<User> {
    const passwordHash = await hashPassword(password);
    const userId = await this.db.transaction(async (trx) => {
      const invitation = await this.invitations.accept(hashSecret(secret), trx);
      if (!invitation) return undefined;
      if (await this.users.findWithSecretByEmail(invitation.email)) {
        throw Problem.conflict('An account with this e-mail already exists.');
      }
      return this.users.insert({ email: invitation.email, name, role: invitation.role, passwordHash }, trx);
    });
    if (userId === undefined) {
      throw Problem.badRequest('This invitation link is unknown, used, revoked or expired.', [{ field: 'token', detail: 'is unknown, used, revoked or expired' }]);
    }
    return (await this.users.findById(userId))!;
  }
}
