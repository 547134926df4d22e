import { Injectable } from '@angular/core';
import { CatalogApi } from './catalog-api';
import type { Conductor, ConductorInput } from './catalog-types';

@Injectable({ providedIn: 'root' })
export class ConductorsApi extends CatalogApi<Conductor, ConductorInput> {
  protected readonly path = 'conductors';
}
