import { Injectable } from '@angular/core';
import { CatalogApi } from './catalog-api';
import type { LineType, LineTypeInput } from './catalog-types';

/**
 * Saved line types. `list` answers without computed results; `get` adds
 * `computed` (the library's result with its material and conductor, the
 * target check and the estimate note). The compare page starts from these.
 */
@Injectable({ providedIn: 'root' })
export class LineTypesApi extends CatalogApi<LineType, LineTypeInput> {
  protected readonly path = 'line-types';
}
