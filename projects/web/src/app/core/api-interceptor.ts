/**
 * Every call to our API: sends the session cookie, adds the header the
 * server requires on cookie-authenticated unsafe requests (CSRF, see
 * server/auth/authenticate.ts), and turns error answers into ApiProblem. A
 * 401 on anything but the session check itself means the session ended.
 */
import type { HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { catchError, throwError } from 'rxjs';
import { toApiProblem } from './api-problem';
import { Session } from './session';

export const API_PREFIX = '/api/';
export const CSRF_HEADER = 'X-Requested-With';
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
/** Answers to these are about signing in, not a sign that an existing session ended. */
const SIGN_IN_PATHS = ['/api/v1/auth/me', '/api/v1/auth/login', '/api/v1/invitations/accept', '/api/v1/auth/password'];

export const apiInterceptor: HttpInterceptorFn = (request, next) => {
  // Only our own relative API paths: a call to another host never gets our cookie or header.
  if (!request.url.startsWith(API_PREFIX)) return next(request);
  const session = inject(Session);
  const prepared = request.clone({
    withCredentials: true,
    setHeaders: SAFE_METHODS.has(request.method) ? {} : { [CSRF_HEADER]: 'XMLHttpRequest' },
  });
  return next(prepared).pipe(
    catchError((error: unknown) => {
      const problem = toApiProblem(error);
      if (problem.status === 401 && !SIGN_IN_PATHS.some((path) => request.url.startsWith(path))) session.forget();
      return throwError(() => problem);
    }),
  );
};
