/** The 2D field solver over HTTP: no sign-in, nothing stored, one bounded job per request. */
import { Router } from 'express';
import type { ApiContract } from '../api-contract';
import type { FieldSolver } from './field-solve-service';

export function fieldSolveRoutes(contract: ApiContract, solver: FieldSolver): Router {
  return Router().post('/field-solve', contract.validate('fieldSolve'), async (req, res) => {
    res.json(await solver.solve(req.body));
  });
}
