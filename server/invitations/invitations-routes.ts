import { Router } from 'express';
import type { ApiContract } from '../api-contract';
import type { Config } from '../config';
import { actorOf, requireRole } from '../auth/principal';
import type { Accounts } from '../auth/auth-service';
import { SESSION_COOKIE, cookieOptions } from '../auth/session-tokens';
import type { Invitations } from './invitations-service';

export function invitationsRoutes(contract: ApiContract, config: Readonly<Config>, invitations: Invitations, accounts: Accounts): Router {
  const admin = requireRole('admin', { allowApiToken: false });
  return Router()
    .get('/invitations', admin, contract.validate('listInvitations'), async (_req, res) => {
      res.json({ items: await invitations.listOpen() });
    })
    .post('/invitations', admin, contract.validate('createInvitation'), async (req, res) => {
      res.status(201).json(await invitations.invite(actorOf(req.principal), req.body.email, req.body.role));
    })
    .delete('/invitations/:id', admin, contract.validate('revokeInvitation'), async (req, res) => {
      await invitations.revoke(Number(req.params['id']));
      res.status(204).end();
    })
    // Public: the one-time link is the credential. The new member is signed in at once.
    .post('/invitations/accept', contract.validate('acceptInvitation'), async (req, res) => {
      const user = await invitations.accept(req.body.token, req.body.name, req.body.password);
      res.cookie(SESSION_COOKIE, accounts.tokenFor(user), cookieOptions(config));
      res.status(201).json({ user });
    });
}
