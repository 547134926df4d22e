/**
 * Who is calling, and the one place that decides whether they may. Every
 * route names the least role it needs; the client hiding a button is only a
 * convenience.
 */
import type { RequestHandler } from 'express';
import { Problem } from '../errors';
import { ROLES, type Role } from '../users/users-repository';

export type TokenScope = 'read' | 'read-write';

export interface Principal {
  userId: number;
  email: string;
  role: Role;
  /** How the caller proved who they are: the browser's cookie, a bearer sign-in token, or a personal API token. */
  via: 'cookie' | 'bearer' | 'api-token';
  scope: TokenScope;
}

/** What services need to know about the caller; they never see `req`. */
export type Actor = Pick<Principal, 'userId' | 'role'>;

declare global {
  // Express's own extension point for per-request data.
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      principal?: Principal;
    }
  }
}

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

export function isSafeMethod(method: string): boolean {
  return SAFE_METHODS.has(method);
}

export function hasRole(role: Role, least: Role): boolean {
  return ROLES.indexOf(role) >= ROLES.indexOf(least);
}

/** Refuses the request unless a principal with at least `least` is signed in (401 / 403). */
export function requireRole(least: Role, options: { allowApiToken?: boolean } = {}): RequestHandler {
  const { allowApiToken = true } = options;
  return (req, _res, next) => {
    const principal = req.principal;
    if (!principal) throw Problem.unauthorized();
    if (!hasRole(principal.role, least)) throw Problem.forbidden(`This needs the ${least} role or higher; you are ${principal.role}.`);
    if (principal.via === 'api-token') {
      if (!allowApiToken) throw Problem.forbidden('API tokens cannot do this; sign in instead.');
      if (principal.scope === 'read' && !isSafeMethod(req.method)) throw Problem.forbidden('This API token is read-only.');
    }
    next();
  };
}

/** The caller as a service sees it; only after requireRole. */
export function actorOf(principal: Principal | undefined): Actor {
  if (!principal) throw Problem.unauthorized();
  return { userId: principal.userId, role: principal.role };
}
