import { Router } from 'express';
import type { ApiContract } from '../api-contract';
import { actorOf, requireRole } from '../auth/principal';
import type { TeamMembers } from './users-service';

export function usersRoutes(contract: ApiContract, members: TeamMembers): Router {
  const admin = requireRole('admin', { allowApiToken: false });
  return Router()
    .get('/users', admin, contract.validate('listUsers'), async (_req, res) => {
      res.json({ items: await members.list() });
    })
    .patch('/users/:id', admin, contract.validate('updateUser'), async (req, res) => {
      res.json(await members.update(actorOf(req.principal), Number(req.params['id']), req.body));
    });
}
