/** The signed-in user's own calls: sign in and out, who am I, unit preferences (server/auth/auth-routes.ts). */
import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { map, type Observable } from 'rxjs';

export const ROLES = ['viewer', 'engineer', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** Units the API stores as preferences (openapi Preferences). */
export type PreferredLengthUnit = 'm' | 'mm' | 'um' | 'mil' | 'in';

export interface UnitPreferences {
  lengthUnit?: PreferredLengthUnit;
  thicknessUnit?: 'm' | 'mm' | 'um' | 'mil' | 'oz';
  frequencyUnit?: 'Hz' | 'kHz' | 'MHz' | 'GHz';
}

export interface User {
  id: number;
  email: string;
  name: string;
  role: Role;
  preferences: UnitPreferences;
  isActive: boolean;
  createdAt?: string;
}

const AUTH = '/api/v1/auth';

@Injectable({ providedIn: 'root' })
export class AuthApi {
  private readonly http = inject(HttpClient);

  signIn(email: string, password: string): Observable<User> {
    return this.http.post<{ user: User }>(`${AUTH}/login`, { email, password }).pipe(map((answer) => answer.user));
  }

  signOut(): Observable<void> {
    return this.http.post<void>(`${AUTH}/logout`, null);
  }

  me(): Observable<User> {
    return this.http.get<User>(`${AUTH}/me`);
  }

  setPreferences(preferences: UnitPreferences): Observable<User> {
    return this.http.patch<User>(`${AUTH}/me/preferences`, preferences);
  }
}
