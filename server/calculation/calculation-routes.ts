/**
 * Calculation needs no sign-in: it reads and writes no team data, and the
 * calculator's "use from a script" hand-off is a plain curl command.
 */
import { Router } from 'express';
import type { ApiContract } from '../api-contract';
import type { Config } from '../config';
import { calculateLine, compareLines, solveLine, sweepLine, toleranceOfLine } from './calculation-service';

export function calculationRoutes(contract: ApiContract, config: Readonly<Config>): Router {
  return Router()
    .post('/calculate', contract.validate('calculate'), (req, res) => {
      res.json(calculateLine(req.body.spec));
    })
    .post('/solve', contract.validate('solve'), (req, res) => {
      res.json(solveLine(req.body));
    })
    .post('/sweep', contract.validate('sweep'), (req, res) => {
      res.json(sweepLine(req.body, config.limits.sweepPoints));
    })
    .post('/tolerance', contract.validate('tolerance'), (req, res) => {
      res.json(toleranceOfLine(req.body));
    })
    .post('/compare', contract.validate('compare'), (req, res) => {
      res.json(compareLines(req.body.specs));
    });
}
