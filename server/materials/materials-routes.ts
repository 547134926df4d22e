/** Materials: the shared catalog routes plus CSV import (multipart, size-limited) and export. */
import { Router } from 'express';
import type { ApiContract } from '../api-contract';
import type { Config } from '../config';
import { actorOf, requireRole } from '../auth/principal';
import { catalogRoutes, listQueryOf } from '../catalog/catalog-routes';
import { exportMaterials, importMaterials, MAX_IMPORT_ROWS } from './materials-csv';
import type { MaterialCatalog } from './materials-service';
import { csvUpload } from '../uploads/csv-upload';

export function materialsRoutes(contract: ApiContract, config: Readonly<Config>, materials: MaterialCatalog): Router {
  const upload = csvUpload(config);
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
