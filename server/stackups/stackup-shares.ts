/**
 * Sharing a stackup's impedance table with the fabricator: an e-mail with a
 * read-only link that expires. The link carries a signed token (JWT, HS256)
 * naming the share; the share row can be revoked and has its own expiry, both
 * checked on every use. The signing key is derived from the server secret for
 * this purpose only, and the token has its own issuer and audience, so a share
 * token is never accepted as a sign-in token (or the other way round).
 */
import { createHmac } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { ESTIMATE_NOTE } from '@linewright/lines';
import type { Config } from '../config';
import { Problem } from '../errors';
import type { Actor } from '../auth/principal';
import type { Mailer } from '../mail/mail-transport';
import type { StackupFilesRepository, StackupShare } from './stackup-files-repository';
import type { StackupRecord } from './stackups-repository';

const SHARE_ISSUER = 'linewright-share';
const SHARE_AUDIENCE = 'stackup-table';
const DAY_SECONDS = 24 * 3600;
export const DEFAULT_SHARE_DAYS = 14;

interface ShareClaims {
  /** Share id. */
  sid: number;
  /** Stackup id. */
  stk: number;
}

export interface CreatedShare extends StackupShare {
  link: string;
}

export class StackupShares {
  private readonly key: string;

  constructor(
    private readonly config: Pick<Config, 'jwtSecret' | 'appUrl'>,
    private readonly files: StackupFilesRepository,
    private readonly mailer: Mailer,
  ) {
    this.key = createHmac('sha256', config.jwtSecret).update('stackup share links').digest('hex');
  }

  /** Records the share, signs its token and mails the link; answers with the link so the sender can copy it. */
  async share(actor: Actor, stackup: StackupRecord, email: string, days = DEFAULT_SHARE_DAYS, message?: string): Promise<CreatedShare> {
    const expiresAt = new Date(Date.now() + days * DAY_SECONDS * 1000);
    const share = await this.files.insertShare({ stackupId: stackup.id, stackupVersion: stackup.version, email, sharedBy: actor.userId, expiresAt });
    const token = this.sign({ sid: share.id, stk: stackup.id }, days * DAY_SECONDS);
    const link = `${this.config.appUrl}/shared/stackup?token=${token}`;
    const api = `${this.config.appUrl}/api/v1/shared/stackups/${token}`;
    await this.mailer.send({
      to: email,
      subject: `Controlled-impedance table: ${stackup.name} (version ${stackup.version})`,
      text: [
        `The impedance table of "${stackup.name}" (version ${stackup.version}) is shared with you, read-only, until ${expiresAt.toISOString().slice(0, 10)}:`,
        link,
        '',
        `PDF: ${api}/table.pdf`,
        `CSV: ${api}/table.csv (send it back with your adjusted widths, gaps and heights and your computed impedance in the same columns)`,
        ...(message ? ['', message] : []),
        '',
        ESTIMATE_NOTE,
      ].join('\n'),
    });
    return { ...share, link };
  }

  /** Signs a share token valid for `seconds` (negative gives an expired one, for tests). */
  sign(claims: ShareClaims, seconds: number): string {
    return jwt.sign(claims, this.key, { algorithm: 'HS256', issuer: SHARE_ISSUER, audience: SHARE_AUDIENCE, expiresIn: seconds });
  }

  /** The share a token stands for: 404 for a token that is not ours, 410 for an expired or revoked one. */
  async open(token: string): Promise<StackupShare> {
    let claims: ShareClaims;
    try {
      claims = jwt.verify(token, this.key, { algorithms: ['HS256'], issuer: SHARE_ISSUER, audience: SHARE_AUDIENCE }) as unknown as ShareClaims;
    } catch (error) {
      // jsonwebtoken throws for every bad token; only the expiry deserves its own answer.
      if ((error as Error).name === 'TokenExpiredError') throw gone('This link has expired; ask the sender for a new one.');
      throw Problem.notFound('This link is not valid.');
    }
    const share = await this.files.findShare(claims.sid);
    if (!share || share.stackupId !== claims.stk) throw Problem.notFound('This link is not valid.');
    if (share.revokedAt) throw gone('This link was withdrawn by the sender.');
    if (new Date(share.expiresAt).getTime() <= Date.now()) throw gone('This link has expired; ask the sender for a new one.');
    return share;
  }

  list(stackupId: number): Promise<StackupShare[]> {
    return this.files.listShares(stackupId);
  }

  async revoke(stackupId: number, id: number): Promise<void> {
    if (!(await this.files.revokeShare(stackupId, id))) throw Problem.notFound('No open share with this id on this stackup.');
  }
}

function gone(detail: string): Problem {
  return new Problem(410, 'Gone', detail);
}
