import type { Router } from 'express';
import type { ApiContract } from '../api-contract';
import { catalogRoutes } from '../catalog/catalog-routes';
import type { ConductorCatalog } from './conductors-service';

export function conductorsRoutes(contract: ApiContract, conductors: ConductorCatalog): Router {
  return catalogRoutes(contract, conductors, { path: 'conductors', singular: 'Conductor', plural: 'Conductors' });
}
