/** Like the other calculations, the step response needs no sign-in and stores nothing. */
import { Router } from 'express';
import type { ApiContract } from '../api-contract';
import { stepResponseOf } from './step-response-service';

export function stepResponseRoutes(contract: ApiContract): Router {
  return Router().post('/step-response', contract.validate('stepResponse'), (req, res) => {
    res.json(stepResponseOf(req.body));
  });
}
