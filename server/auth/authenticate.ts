/**
 * Finds out who is calling, from (in this order) a personal API token or a
 * sign-in JWT in `Authorization: Bearer`, or the JWT in the session cookie.
 * JWTs are checked by passport-jwt; the user is then re-read so a
 * deactivated account, a changed role or a bumped session version applies at
 * once. Requests without credentials pass on anonymous: requireRole decides.
 *
 * CSRF: the cookie is SameSite=Strict, and an unsafe request authenticated by
 * the cookie must also carry an `X-Requested-With` header, which a cross-site
 * form cannot set and a cross-site script cannot send without a CORS preflight
 * this server never grants.
 */
import type { Request, RequestHandler } from 'express';
import { Passport } from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import type { Config } from '../config';
import { Problem } from '../errors';
import type { UsersRepository, User } from '../users/users-repository';
import { API_TOKEN_PREFIX, type PersonalTokens } from '../tokens/tokens-service';
import { isSafeMethod, type Principal } from './principal';
import { JWT_ALGORITHM, JWT_ISSUER, SESSION_COOKIE, type SessionClaims } from './session-tokens';

export const CSRF_HEADER = 'x-requested-with';

const bearerOf = ExtractJwt.fromAuthHeaderAsBearerToken();

function cookieOf(req: Request): string | null {
  return (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE] ?? null;
}

/** A bearer value that is not an API token is a JWT; without a bearer, the cookie's. */
function jwtOf(req: Request): string | null {
  const bearer = bearerOf(req);
  if (bearer) return bearer.startsWith(API_TOKEN_PREFIX) ? null : bearer;
  return cookieOf(req);
}

function principalOf(user: User, via: Principal['via'], scope: Principal['scope']): Principal {
  return { userId: user.id, email: user.email, role: user.role, via, scope };
}

export function authenticate(config: Pick<Config, 'jwtSecret'>, users: UsersRepository, tokens: PersonalTokens): RequestHandler {
  const passport = new Passport();
  passport.use(
    new JwtStrategy(
      { jwtFromRequest: jwtOf, secretOrKey: config.jwtSecret, algorithms: [JWT_ALGORITHM], issuer: JWT_ISSUER },
      (claims: SessionClaims, done: (error: unknown, user?: User | false) => void) => {
        users.findById(Number(claims.sub)).then(
          (user) => done(null, user && user.isActive && user.sessionVersion === claims.sv ? user : false),
          done,
        );
      },
    ),
  );
  const verifyJwt = (req: Request) =>
    new Promise<User | undefined>((resolve, reject) => {
      passport.authenticate('jwt', { session: false }, (error: unknown, user: User | false) => {
        if (error) reject(error);
        else resolve(user || undefined);
      })(req, undefined as never, reject);
    });

  return async (req, _res, next) => {
    const bearer = bearerOf(req);
    if (bearer?.startsWith(API_TOKEN_PREFIX)) {
      const token = await tokens.resolve(bearer);
      const user = token ? await users.findById(token.userId) : undefined;
      // A revoked or unknown token is refused outright rather than treated as anonymous.
      if (!token || !user?.isActive) throw Problem.unauthorized('This API token is unknown or revoked.');
      req.principal = principalOf(user, 'api-token', token.scope);
      return next();
    }
    if (!jwtOf(req)) return next();
    const user = await verifyJwt(req);
    if (!user) {
      if (bearer) throw Problem.unauthorized('The bearer token is invalid or has expired; sign in again.');
      // A stale cookie makes the caller anonymous (sign-in must still work), not an error.
      return next();
    }
    const via = bearer ? 'bearer' : 'cookie';
    if (via === 'cookie' && !isSafeMethod(req.method) && !req.get(CSRF_HEADER)) {
      throw Problem.forbidden(`A cookie-authenticated ${req.method} must carry the X-Requested-With header.`);
    }
    req.principal = principalOf(user, via, 'read-write');
    next();
  };
}
