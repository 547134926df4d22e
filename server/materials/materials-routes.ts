/** Materials: the shared catalog routes plus CSV import (multipart, size-limited) and export. */
import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import type { ApiContract } from '../api-contract';
import { Problem } from '../errors';
import type { Config } from '../config';
import { actorOf, requireRole } from '../auth/principal';
import { catalogRoutes, listQueryOf } from '../catalog/catalog-routes';
import { exportMaterials, importMaterials, MAX_IMPORT_ROWS } from './materials-csv';
import type { MaterialCatalog } from './materials-service';

export function materialsRoutes(contract: ApiContract, config: Readonly<Config>, materials: MaterialCatalog): Router {
  const multipart = multer({ storage: multer.memoryStorage(), limits: { fileSize: config.limits.csvBytes, files: 1, fields: 0 } }).single('file');
  // Multer reports a broken multipart body or an unexpected part as a bare error; it is the client's, so 400 naming the field.
  const upload: RequestHandler = (req, res, next) =>
    multipart(req, res, (error?: unknown) => {
      if (!error || (error as { code?: string }).code === 'LIMIT_FILE_SIZE') return next(error);
      next(Problem.badRequest(`The upload is not a single CSV file in the multipart field "file": ${(error as Error).message}`, [{ field: 'file', detail: 'must be one file in the multipart field "file"' }]));
    });
  const rowSchema = contract.schemaValidator('MaterialInput');
  return Router()
    .get('/materials/export', requireRole('viewer'), contract.validate('exportMaterials'), async (req, res) => {
      const page = await materials.list({ ...listQueryOf(req), page: 1, pageSize: MAX_IMPORT_ROWS });
      res.type('text/csv').attachment('materials.csv').send(exportMaterials(page.items));
    })
    .post('/materials/import', requireRole('engineer'), upload, contract.validate('importMaterials'), async (req, res) => {
      res.status(201).json(await importMaterials(materials, rowSchema, actorOf(req.principal), req.file?.buffer));
    })
    .use(catalogRoutes(contract, materials, { path: 'materials', singular: 'Material', plural: 'Materials' }));
}
