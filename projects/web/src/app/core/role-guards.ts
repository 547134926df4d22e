/**
 * Route guards by role. They wait for the session check, send a signed-out
 * visitor to sign-in (coming back afterwards) and a signed-in one without
 * the role to the "not allowed" page. The server checks every call anyway.
 */
import { inject } from '@angular/core';
import { Router, type CanActivateFn } from '@angular/router';
import type { Role } from './auth-api';
import { Session, hasRole } from './session';

export function requireRole(least: Role): CanActivateFn {
  return async (_route, state) => {
    const router = inject(Router);
    const user = await inject(Session).ready();
    if (!user) return router.createUrlTree(['/sign-in'], { queryParams: { returnUrl: state.url } });
    return hasRole(user, least) ? true : router.createUrlTree(['/not-allowed'], { queryParams: { needs: least } });
  };
}

/** Any signed-in person (viewer or more). */
export const signedInGuard: CanActivateFn = requireRole('viewer');
