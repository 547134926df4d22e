import { Router } from 'express';
import type { ApiContract } from '../api-contract';
import { calculateLine } from './calculation-service';

export function calculationRoutes(contract: ApiContract): Router {
  return Router().post('/calculate', contract.validate('calculate'), (req, res) => {
    res.json(calculateLine(req.body.spec));
  });
}
