/**
 * Short-lived sign-in tokens (JWT, HS256). The same token travels in the
 * browser's httpOnly cookie or in a script's `Authorization: Bearer` header.
 * `sv` is the user's session version: a password change or reset bumps it,
 * which voids every token issued before.
 */
import jwt from 'jsonwebtoken';
import type { Config } from '../config';

export const SESSION_COOKIE = 'linewright_session';
export const JWT_ALGORITHM = 'HS256';
export const JWT_ISSUER = 'linewright';

export interface SessionClaims {
  sub: string;
  sv: number;
}

export function issueSessionToken(config: Pick<Config, 'jwtSecret' | 'jwtLifetimeSeconds'>, userId: number, sessionVersion: number): string {
  const claims: Pick<SessionClaims, 'sv'> = { sv: sessionVersion };
  return jwt.sign(claims, config.jwtSecret, {
    algorithm: JWT_ALGORITHM,
    subject: String(userId),
    issuer: JWT_ISSUER,
    expiresIn: config.jwtLifetimeSeconds,
  });
}

export function cookieOptions(config: Pick<Config, 'isProduction' | 'jwtLifetimeSeconds'>) {
  return {
    httpOnly: true,
    sameSite: 'strict' as const,
    secure: config.isProduction,
    path: '/',
    maxAge: config.jwtLifetimeSeconds * 1000,
  };
}
