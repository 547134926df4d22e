import { HttpResponse } from '@angular/common/http';
import { Injectable } from '@angular/core';
import { map, type Observable } from 'rxjs';
import { API_BASE, CatalogApi } from '../catalog/catalog-api';
import type { Versioned } from '../catalog/catalog-types';
import type { CouponReport, ImpedanceTableAnswer, ReplyReport, SharedStackup, Stackup, StackupInput, StackupShare, StackupUpload } from './stackup-types';

/**
 * Stackups: the catalog calls, plus the impedance table and its exports,
 * shares with the fabricator, and the reply and coupon uploads.
 */
@Injectable({ providedIn: 'root' })
export class StackupsApi extends CatalogApi<Stackup, StackupInput> {
  protected readonly path = 'stackups';

  table(id: number): Observable<ImpedanceTableAnswer> {
    return this.http.get<ImpedanceTableAnswer>(`${this.url}/${id}/table`);
  }

  /** Plain GETs answered as attachments: the browser downloads them with the session cookie. */
  exportUrl(id: number, format: 'csv' | 'pdf'): string {
    return `${this.url}/${id}/table.${format}`;
  }

  solve(id: number, etag: string, placementId: string, unknown: 'width' | 'gap'): Observable<Versioned<Stackup>> {
    return this.http
      .post<Stackup>(`${this.url}/${id}/placements/${placementId}/solve`, { unknown }, { observe: 'response', headers: { 'If-Match': etag } })
      .pipe(map(versionedOf));
  }

  share(id: number, email: string, days: number, message: string): Observable<StackupShare> {
    return this.http.post<StackupShare>(`${this.url}/${id}/shares`, { email, days, ...(message ? { message } : {}) });
  }

  shares(id: number): Observable<{ items: StackupShare[] }> {
    return this.http.get<{ items: StackupShare[] }>(`${this.url}/${id}/shares`);
  }

  revokeShare(id: number, shareId: number): Observable<void> {
    return this.http.delete<void>(`${this.url}/${id}/shares/${shareId}`);
  }

  uploadReply(id: number, file: File): Observable<StackupUpload<ReplyReport>> {
    return this.http.post<StackupUpload<ReplyReport>>(`${this.url}/${id}/fabricator-replies`, formOf(file));
  }

  replies(id: number): Observable<{ items: StackupUpload<ReplyReport>[] }> {
    return this.http.get<{ items: StackupUpload<ReplyReport>[] }>(`${this.url}/${id}/fabricator-replies`);
  }

  uploadCoupon(id: number, file: File): Observable<StackupUpload<CouponReport>> {
    return this.http.post<StackupUpload<CouponReport>>(`${this.url}/${id}/coupons`, formOf(file));
  }

  coupons(id: number): Observable<{ items: StackupUpload<CouponReport>[] }> {
    return this.http.get<{ items: StackupUpload<CouponReport>[] }>(`${this.url}/${id}/coupons`);
  }

  shared(token: string): Observable<SharedStackup> {
    return this.http.get<SharedStackup>(`${API_BASE}/shared/stackups/${encodeURIComponent(token)}`);
  }

  sharedExportUrl(token: string, format: 'csv' | 'pdf'): string {
    return `${API_BASE}/shared/stackups/${encodeURIComponent(token)}/table.${format}`;
  }
}

function versionedOf(response: HttpResponse<Stackup>): Versioned<Stackup> {
  const item = response.body!;
  return { item, etag: response.headers.get('ETag') ?? `"${item.version}"` };
}

function formOf(file: File): FormData {
  const body = new FormData();
  body.append('file', file, file.name);
  return body;
}
