/**
 * The HTTP calls every catalog shares (materials, conductors, line types):
 * list with filter, sort and pages; get with its ETag; create; update and
 * state change with If-Match; delete. Each catalog's `*-api.ts` names its path.
 */
import { HttpClient, HttpParams, type HttpResponse } from '@angular/common/http';
import { inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { CatalogEntry, CatalogState, ListQuery, Page, Versioned } from './catalog-types';

export const API_BASE = '/api/v1';

export function listParams(query: Partial<ListQuery>): HttpParams {
  let params = new HttpParams();
  const plain: Record<string, string | number | undefined> = { page: query.page, pageSize: query.pageSize, sort: query.sort, q: query.q?.trim() || undefined, state: query.state, ...query.filters };
  for (const [name, value] of Object.entries(plain)) {
    if (value !== undefined && value !== '') params = params.set(name, String(value));
  }
  return params;
}

/** The entry and the ETag the server sent; a missing header falls back to the body's version. */
function versioned<T extends CatalogEntry>(response: HttpResponse<T>): Versioned<T> {
  const item = response.body!;
  return { item, etag: response.headers.get('ETag') ?? `"${item.version}"` };
}

export abstract class CatalogApi<T extends CatalogEntry, I> {
  protected readonly http = inject(HttpClient);
  /** URL segment under /api/v1, e.g. 'materials'. */
  protected abstract readonly path: string;

  protected get url(): string {
    return `${API_BASE}/${this.path}`;
  }

  list(query: Partial<ListQuery>): Observable<Page<T>> {
    return this.http.get<Page<T>>(this.url, { params: listParams(query) });
  }

  get(id: number): Observable<Versioned<T>> {
    return this.http.get<T>(`${this.url}/${id}`, { observe: 'response' }).pipe(map(versioned));
  }

  create(input: I): Observable<Versioned<T>> {
    return this.http.post<T>(this.url, input, { observe: 'response' }).pipe(map(versioned));
  }

  update(id: number, etag: string, changes: Partial<I>): Observable<Versioned<T>> {
    return this.http.patch<T>(`${this.url}/${id}`, changes, { observe: 'response', headers: { 'If-Match': etag } }).pipe(map(versioned));
  }

  changeState(id: number, etag: string, state: CatalogState): Observable<Versioned<T>> {
    return this.http.post<T>(`${this.url}/${id}/state`, { state }, { observe: 'response', headers: { 'If-Match': etag } }).pipe(map(versioned));
  }

  remove(id: number, etag: string): Observable<void> {
    return this.http.delete<void>(`${this.url}/${id}`, { headers: { 'If-Match': etag } });
  }
}
