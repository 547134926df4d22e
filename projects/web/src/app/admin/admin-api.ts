/** Team administration: users and roles, invitations, and the development mail catcher (admin only). */
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';
import type { Role, User } from '../core/auth-api';

export interface Invitation {
  id: number;
  email: string;
  role: Role;
  invitedBy: number | null;
  expiresAt: string;
  createdAt: string;
}

export interface CaughtMail {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

const API = '/api/v1';

@Injectable({ providedIn: 'root' })
export class AdminApi {
  private readonly http = inject(HttpClient);

  users(): Observable<User[]> {
    return this.http.get<{ items: User[] }>(`${API}/users`).pipe(map((answer) => answer.items));
  }

  updateUser(id: number, changes: Partial<Pick<User, 'role' | 'isActive' | 'name'>>): Observable<User> {
    return this.http.patch<User>(`${API}/users/${id}`, changes);
  }

  invitations(): Observable<Invitation[]> {
    return this.http.get<{ items: Invitation[] }>(`${API}/invitations`).pipe(map((answer) => answer.items));
  }

  invite(email: string, role: Role): Observable<Invitation> {
    return this.http.post<Invitation>(`${API}/invitations`, { email, role });
  }

  revokeInvitation(id: number): Observable<void> {
    return this.http.delete<void>(`${API}/invitations/${id}`);
  }

  /** Absent (404) in production: the catcher only runs in development and tests. */
  caughtMail(): Observable<CaughtMail[]> {
    return this.http.get<{ items: CaughtMail[] }>(`${API}/dev/mail`, { headers: { Accept: 'application/json' } }).pipe(map((answer) => answer.items));
  }
}
