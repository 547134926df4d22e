/** Every query on the `invitations` table. Links are stored as SHA-256 hashes only. */
import type { Knex } from 'knex';
import type { Role } from '../users/users-repository';

export interface Invitation {
  id: number;
  email: string;
  role: Role;
  invitedBy: number | null;
  expiresAt: string;
  acceptedAt: string | null;
  revokedAt: string | null;
  createdAt: string;
}

interface InvitationRow {
  id: number;
  email: string;
  role: Role;
  invited_by: number | null;
  expires_at: Date;
  accepted_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
}

const iso = (value: Date | null) => (value ? new Date(value).toISOString() : null);

function toInvitation(row: InvitationRow): Invitation {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    invitedBy: row.invited_by,
    expiresAt: iso(row.expires_at)!,
    acceptedAt: iso(row.accepted_at),
    revokedAt: iso(row.revoked_at),
    createdAt: iso(row.created_at)!,
  };
}

export class InvitationsRepository {
  constructor(private readonly db: Knex) {}

  async insert(invitation: { email: string; role: Role; invitedBy: number; tokenHash: string; expiresAt: Date }): Promise<Invitation> {
    const [id] = await this.db('invitations').insert({
      email: invitation.email.toLowerCase(),
      role: invitation.role,
      invited_by: invitation.invitedBy,
      token_hash: invitation.tokenHash,
      expires_at: invitation.expiresAt,
    });
    return toInvitation((await this.db<InvitationRow>('invitations').where({ id }).first())!);
  }

  /** Invitations not yet accepted or revoked, newest first. */
  async listOpen(): Promise<Invitation[]> {
    const rows = await this.db<InvitationRow>('invitations').whereNull('accepted_at').whereNull('revoked_at').orderBy('id', 'desc');
    return rows.map(toInvitation);
  }

  async revoke(id: number): Promise<boolean> {
    const changed = await this.db('invitations').where({ id }).whereNull('accepted_at').whereNull('revoked_at').update({ revoked_at: this.db.fn.now() });
    return changed > 0;
  }

  /** Marks a live invitation accepted (one conditional update, so a link works once) and returns it. */
  async accept(tokenHash: string, trx: Knex): Promise<Invitation | undefined> {
    const row = await trx('invitations')
      .where({ token_hash: tokenHash })
      .whereNull('accepted_at')
      .whereNull('revoked_at')
      .where('expires_at', '>', trx.fn.now())
      .first();
    if (!row) return undefined;
    const changed = await trx('invitations').where({ id: row.id }).whereNull('accepted_at').update({ accepted_at: trx.fn.now() });
    return changed === 1 ? toInvitation(row) : undefined;
  }
}
