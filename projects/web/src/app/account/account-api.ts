/** Password, reset, invitation acceptance and personal API tokens (server/auth, server/invitations, server/tokens). */
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { User } from '../core/auth-api';

export type TokenScope = 'read' | 'read-write';

export interface ApiToken {
  id: number;
  name: string;
  scope: TokenScope;
  /** The first characters of the secret, to tell tokens apart. */
  prefix: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
  createdAt: string;
}

export interface CreatedToken {
  token: ApiToken;
  /** Shown in this answer only. */
  secret: string;
}

const API = '/api/v1';

@Injectable({ providedIn: 'root' })
export class AccountApi {
  private readonly http = inject(HttpClient);

  changePassword(currentPassword: string, newPassword: string): Observable<void> {
    return this.http.post<void>(`${API}/auth/password`, { currentPassword, newPassword });
  }

  requestReset(email: string): Observable<string> {
    return this.http.post<{ detail: string }>(`${API}/auth/password-reset`, { email }).pipe(map((answer) => answer.detail));
  }

  confirmReset(token: string, newPassword: string): Observable<void> {
    return this.http.post<void>(`${API}/auth/password-reset/confirm`, { token, newPassword });
  }

  acceptInvitation(token: string, name: string, password: string): Observable<User> {
    return this.http.post<{ user: User }>(`${API}/invitations/accept`, { token, name, password }).pipe(map((answer) => answer.user));
  }

  tokens(): Observable<ApiToken[]> {
    return this.http.get<{ items: ApiToken[] }>(`${API}/tokens`).pipe(map((answer) => answer.items));
  }

  createToken(name: string, scope: TokenScope): Observable<CreatedToken> {
    return this.http.post<CreatedToken>(`${API}/tokens`, { name, scope });
  }

  revokeToken(id: number): Observable<void> {
    return this.http.delete<void>(`${API}/tokens/${id}`);
  }
}
