import { Router } from 'express';
import type { ApiContract } from '../api-contract';
import { actorOf, requireRole } from '../auth/principal';
import type { PersonalTokens } from './tokens-service';

/** Tokens are managed only by a signed-in person: a token cannot mint or revoke tokens. */
export function tokensRoutes(contract: ApiContract, tokens: PersonalTokens): Router {
  const signedIn = requireRole('viewer', { allowApiToken: false });
  return Router()
    .get('/tokens', signedIn, contract.validate('listTokens'), async (req, res) => {
      res.json({ items: await tokens.list(actorOf(req.principal)) });
    })
    .post('/tokens', signedIn, contract.validate('createToken'), async (req, res) => {
      const created = await tokens.create(actorOf(req.principal), req.body.name, req.body.scope);
      res.status(201).json(created);
    })
    .delete('/tokens/:id', signedIn, contract.validate('revokeToken'), async (req, res) => {
      await tokens.revoke(actorOf(req.principal), Number(req.params['id']));
      res.status(204).end();
    });
}
