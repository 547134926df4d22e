import { Injectable } from '@angular/core';
import type { Observable } from 'rxjs';
import { CatalogApi, listParams } from './catalog-api';
import type { ListQuery, Material, MaterialInput } from './catalog-types';

export interface ImportReport {
  created: number;
  items: Material[];
}

/** Materials, plus the CSV import (all rows or none) and export. */
@Injectable({ providedIn: 'root' })
export class MaterialsApi extends CatalogApi<Material, MaterialInput> {
  protected readonly path = 'materials';

  importCsv(file: Blob, fileName: string): Observable<ImportReport> {
    const body = new FormData();
    body.append('file', file, fileName);
    return this.http.post<ImportReport>(`${this.url}/import`, body);
  }

  /** The export link for the current filter; a plain GET, so the browser downloads it with the session cookie. */
  exportUrl(query: Pick<Partial<ListQuery>, 'q' | 'state' | 'sort'>): string {
    const params = listParams(query).toString();
    return `${this.url}/export${params ? `?${params}` : ''}`;
  }
}
