import type { Router } from 'express';
import type { ApiContract } from '../api-contract';
import { catalogRoutes } from '../catalog/catalog-routes';
import type { LineTypeCatalog } from './line-types-service';

/** The catalog routes; GET answers include `computed`, the library's result for the line type. */
export function lineTypesRoutes(contract: ApiContract, lineTypes: LineTypeCatalog): Router {
  return catalogRoutes(contract, lineTypes, { path: 'line-types', singular: 'LineType', plural: 'LineTypes' });
}
