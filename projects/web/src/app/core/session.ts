/**
 * Who is signed in, read once from GET /auth/me and kept in signals. The
 * cookie itself is httpOnly, so this is the client's only view of it. Role
 * checks here only hide what the server would refuse anyway.
 */
import { Injectable, computed, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { AuthApi, ROLES, type PreferredLengthUnit, type Role, type User } from './auth-api';
import type { ApiProblem } from './api-problem';

/** The length units a person picks in forms (the shared unit lists' ids); metres only make sense to scripts. */
export type FormLengthUnit = Exclude<PreferredLengthUnit, 'm'>;

const DEFAULT_LENGTH_UNIT: FormLengthUnit = 'mm';

export function hasRole(user: User | null | undefined, least: Role): boolean {
  return !!user && ROLES.indexOf(user.role) >= ROLES.indexOf(least);
}

@Injectable({ providedIn: 'root' })
export class Session {
  private readonly api = inject(AuthApi);
  /** undefined until the first check answers, null when signed out. */
  private readonly current = signal<User | null | undefined>(undefined);
  private check: Promise<User | null> | undefined;

  readonly user = this.current.asReadonly();
  readonly isKnown = computed(() => this.current() !== undefined);
  readonly isSignedIn = computed(() => !!this.current());
  readonly canEdit = computed(() => hasRole(this.current(), 'engineer'));
  readonly isAdmin = computed(() => hasRole(this.current(), 'admin'));
  /** The length unit forms start in: the account's preference, else mm. */
  readonly preferredLengthUnit = computed<FormLengthUnit>(() => {
    const unit = this.current()?.preferences?.lengthUnit;
    return unit && unit !== 'm' ? unit : DEFAULT_LENGTH_UNIT;
  });

  /** The signed-in user, asking the server the first time (a 401 means signed out). */
  ready(): Promise<User | null> {
    this.check ??= firstValueFrom(this.api.me()).then(
      (user) => this.settle(user),
      (problem: ApiProblem) => {
        // Only "not signed in" is an answer; a network failure leaves the question open for the next caller.
        if (problem.status !== 401) this.check = undefined;
        return this.settle(null);
      },
    );
    return this.check;
  }

  async signIn(email: string, password: string): Promise<User> {
    return this.settle(await firstValueFrom(this.api.signIn(email, password)));
  }

  async signOut(): Promise<void> {
    await firstValueFrom(this.api.signOut());
    this.forget();
  }

  /** After the server set a session by other means (accepting an invitation). */
  adopt(user: User): void {
    this.settle(user);
  }

  /** The server no longer knows the session (a 401 elsewhere, or signed out). */
  forget(): void {
    this.settle(null);
  }

  async setPreferredLengthUnit(unit: FormLengthUnit): Promise<void> {
    this.settle(await firstValueFrom(this.api.setPreferences({ lengthUnit: unit })));
  }

  private settle<T extends User | null>(user: T): T {
    this.current.set(user);
    this.check = Promise.resolve(user);
    return user;
  }
}
