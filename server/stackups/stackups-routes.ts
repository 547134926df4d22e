/**
 * Stackups: the shared catalog routes, plus placements, the impedance table
 * (JSON, CSV, PDF), shares with the fabricator, the fabricator's reply and
 * coupon measurements (CSV uploads).
 */
import { Router, type Request, type RequestHandler } from 'express';
import type { ApiContract } from '../api-contract';
import type { Config } from '../config';
import { Problem } from '../errors';
import { actorOf, requireRole } from '../auth/principal';
import { catalogRoutes, versionOf } from '../catalog/catalog-routes';
import { etagOf } from '../catalog/catalog-service';
import { compareReply } from './fabricator-reply';
import { DEFAULT_WINDOW, evaluateCoupon } from './coupon-measurement';
import type { StackupFilesRepository } from './stackup-files-repository';
import { tableCsv } from './stackup-csv';
import { tablePdf } from './stackup-pdf';
import { csvUpload } from '../uploads/csv-upload';
import type { StackupShares } from './stackup-shares';
import type { StackupCatalog } from './stackups-service';
import type { StackupRecord } from './stackups-repository';

/** A file name safe for Content-Disposition. */
export const fileStem = (record: Pick<StackupRecord, 'name' | 'version'>) => `${record.name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '') || 'stackup'}-v${record.version}`;

function fraction(value: unknown, field: string, fallback: number): number {
  if (value === undefined || value === '') return fallback;
  const number = Number(value);
  if (!(number >= 0 && number <= 1)) throw Problem.badRequest(`${field} must be a fraction from 0 to 1.`, [{ field, detail: 'must be a number from 0 to 1' }]);
  return number;
}

export function stackupsRoutes(contract: ApiContract, config: Readonly<Config>, stackups: StackupCatalog, shares: StackupShares, files: StackupFilesRepository): Router {
  const reader = requireRole('viewer');
  const writer = requireRole('engineer');
  const id = (params: Request['params']) => Number(params['id']);
  const answer = async (res: Parameters<RequestHandler>[1], record: StackupRecord, status = 200) =>
    res.status(status).set('ETag', etagOf(record.version)).json(await stackups.present(record));

  return Router()
    .get('/stackups/:id/table', reader, contract.validate('getStackupTable'), async (req, res) => {
      res.json(await stackups.table(await stackups.get(id(req.params))));
    })
    .get('/stackups/:id/table.csv', reader, contract.validate('getStackupTableCsv'), async (req, res) => {
      const record = await stackups.get(id(req.params));
      res.type('text/csv').attachment(`${fileStem(record)}-impedance.csv`).send(tableCsv(await stackups.table(record)));
    })
    .get('/stackups/:id/table.pdf', reader, contract.validate('getStackupTablePdf'), async (req, res) => {
      const record = await stackups.get(id(req.params));
      res.type('application/pdf').attachment(`${fileStem(record)}-impedance.pdf`).send(await tablePdf(await stackups.table(record)));
    })
    .post('/stackups/:id/placements', writer, contract.validate('addStackupPlacement'), async (req, res) => {
      const record = await stackups.writePlacements(actorOf(req.principal), id(req.params), versionOf(req), (placements) => [...placements, req.body]);
      await answer(res, record, 201);
    })
    .delete('/stackups/:id/placements/:placementId', writer, contract.validate('removeStackupPlacement'), async (req, res) => {
      const placementId = String(req.params['placementId']);
      const record = await stackups.writePlacements(actorOf(req.principal), id(req.params), versionOf(req), (placements) => {
        if (!placements.some((placement) => placement.id === placementId)) throw Problem.notFound(`No placement ${placementId} on this stackup.`);
        return placements.filter((placement) => placement.id !== placementId);
      });
      await answer(res, record);
    })
    .post('/stackups/:id/placements/:placementId/solve', writer, contract.validate('solveStackupPlacement'), async (req, res) => {
      const record = await stackups.solvePlacement(actorOf(req.principal), id(req.params), versionOf(req), String(req.params['placementId']), req.body?.unknown ?? 'width');
      await answer(res, record);
    })
    .get('/stackups/:id/shares', writer, contract.validate('listStackupShares'), async (req, res) => {
      await stackups.get(id(req.params));
      res.json({ items: await shares.list(id(req.params)) });
    })
    .post('/stackups/:id/shares', writer, contract.validate('shareStackup'), async (req, res) => {
      const record = await stackups.get(id(req.params));
      res.status(201).json(await shares.share(actorOf(req.principal), record, req.body.email, req.body.days, req.body.message));
    })
    .delete('/stackups/:id/shares/:shareId', writer, contract.validate('revokeStackupShare'), async (req, res) => {
      await shares.revoke(id(req.params), Number(req.params['shareId']));
      res.status(204).end();
    })
    .get('/stackups/:id/fabricator-replies', reader, contract.validate('listFabricatorReplies'), async (req, res) => {
      res.json({ items: await files.listUploads(id(req.params), 'fabricator-reply') });
    })
    .post('/stackups/:id/fabricator-replies', writer, csvUpload(config, 0), contract.validate('uploadFabricatorReply'), async (req, res) => {
      const record = await stackups.get(id(req.params));
      const table = await stackups.table(record);
      const { stackup } = await stackups.resolve(record);
      const report = compareReply(req.file?.buffer, table, stackup);
      const stored = await files.insertUpload({ stackupId: record.id, stackupVersion: record.version, kind: 'fabricator-reply', fileName: req.file?.originalname ?? null, report, uploadedBy: actorOf(req.principal).userId });
      res.status(201).json(stored);
    })
    .get('/stackups/:id/coupons', reader, contract.validate('listCouponMeasurements'), async (req, res) => {
      res.json({ items: await files.listUploads(id(req.params), 'coupon') });
    })
    .post('/stackups/:id/coupons', writer, csvUpload(config, 2), contract.validate('uploadCouponMeasurement'), async (req, res) => {
      const record = await stackups.get(id(req.params));
      const fields = (req.body ?? {}) as Record<string, string>;
      const window = [fraction(fields['windowFrom'], 'windowFrom', DEFAULT_WINDOW[0]), fraction(fields['windowTo'], 'windowTo', DEFAULT_WINDOW[1])] as const;
      const report = evaluateCoupon(req.file?.buffer, await stackups.table(record), window);
      const stored = await files.insertUpload({ stackupId: record.id, stackupVersion: record.version, kind: 'coupon', fileName: req.file?.originalname ?? null, report, uploadedBy: actorOf(req.principal).userId });
      res.status(201).json(stored);
    })
    .use(catalogRoutes(contract, stackups, { path: 'stackups', singular: 'Stackup', plural: 'Stackups' }));
}

/**
 * What a share link opens, without signing in: the stackup and its table, as
 * JSON, CSV or PDF. Only GET exists here; anything else answers 405.
 */
export function sharedStackupRoutes(contract: ApiContract, stackups: StackupCatalog, shares: StackupShares): Router {
  const open = async (token: string) => {
    const share = await shares.open(token);
    const record = await stackups.get(share.stackupId);
    return { share, record, table: await stackups.table(record) };
  };
  return Router()
    .get('/shared/stackups/:token', contract.validate('getSharedStackup'), async (req, res) => {
      const { share, record, table } = await open(String(req.params['token']));
      res.set('Cache-Control', 'no-store').json({
        share: { email: share.email, expiresAt: share.expiresAt, sharedVersion: share.stackupVersion, isChangedSinceShared: record.version !== share.stackupVersion },
        stackup: await stackups.present(record),
        table,
      });
    })
    .get('/shared/stackups/:token/table.csv', contract.validate('getSharedStackupCsv'), async (req, res) => {
      const { record, table } = await open(String(req.params['token']));
      res.set('Cache-Control', 'no-store').type('text/csv').attachment(`${fileStem(record)}-impedance.csv`).send(tableCsv(table));
    })
    .get('/shared/stackups/:token/table.pdf', contract.validate('getSharedStackupPdf'), async (req, res) => {
      const { record, table } = await open(String(req.params['token']));
      res.set('Cache-Control', 'no-store').type('application/pdf').attachment(`${fileStem(record)}-impedance.pdf`).send(await tablePdf(table));
    })
    .all('/shared/{*rest}', (req) => {
      if (req.method === 'GET' || req.method === 'HEAD') throw Problem.notFound('No such shared resource.');
      throw new Problem(405, 'Method not allowed', 'A shared link is read-only.', [], { Allow: 'GET' });
    });
}
