/**
 * Sign-in for the browser (httpOnly cookie) and for scripts (bearer JWT),
 * sign-out, the signed-in user, unit preferences, password change and reset.
 */
import { Router, type Response } from 'express';
import type { ApiContract } from '../api-contract';
import type { Config } from '../config';
import { requireRole, actorOf } from './principal';
import { rateLimiter } from './rate-limits';
import { SESSION_COOKIE, cookieOptions } from './session-tokens';
import type { Accounts } from './auth-service';

export function authRoutes(contract: ApiContract, config: Readonly<Config>, accounts: Accounts): Router {
  const loginLimit = rateLimiter(config, config.rateLimits.login, 'sign-in');
  const resetLimit = rateLimiter(config, config.rateLimits.passwordReset, 'password-reset');
  const setCookie = (res: Response, token: string) => res.cookie(SESSION_COOKIE, token, cookieOptions(config));
  // A person signed in by cookie or bearer JWT; API tokens cannot change the account itself.
  const person = requireRole('viewer', { allowApiToken: false });

  return Router()
    .post('/auth/login', loginLimit, contract.validate('login'), async (req, res) => {
      const { user, token } = await accounts.signIn(req.body.email, req.body.password);
      setCookie(res, token);
      res.json({ user });
    })
    .post('/auth/token', loginLimit, contract.validate('issueToken'), async (req, res) => {
      const { token } = await accounts.signIn(req.body.email, req.body.password);
      res.json({ accessToken: token, tokenType: 'Bearer', expiresIn: config.jwtLifetimeSeconds });
    })
    .post('/auth/logout', contract.validate('logout'), (_req, res) => {
      const { maxAge: _unused, ...options } = cookieOptions(config);
      res.clearCookie(SESSION_COOKIE, options).status(204).end();
    })
    .get('/auth/me', requireRole('viewer'), contract.validate('getMe'), async (req, res) => {
      res.json(await accounts.me(actorOf(req.principal).userId));
    })
    .patch('/auth/me/preferences', person, contract.validate('updatePreferences'), async (req, res) => {
      res.json(await accounts.setPreferences(actorOf(req.principal).userId, req.body));
    })
    .post('/auth/password', person, contract.validate('changePassword'), async (req, res) => {
      const { token } = await accounts.changePassword(actorOf(req.principal).userId, req.body.currentPassword, req.body.newPassword);
      // The old token is void now (session version bumped); a browser session carries on with a new one.
      if (req.principal?.via === 'cookie') setCookie(res, token);
      res.status(204).end();
    })
    .post('/auth/password-reset', resetLimit, contract.validate('requestPasswordReset'), async (req, res) => {
      try {
        await accounts.requestReset(req.body.email);
      } catch (error) {
        // A different answer when the mail cannot go out would tell the caller the address has an account.
        req.log.error({ err: error }, 'password reset could not be sent');
      }
      res.status(202).json({ detail: 'If the address belongs to an account, a reset link is on its way.' });
    })
    .post('/auth/password-reset/confirm', resetLimit, contract.validate('confirmPasswordReset'), async (req, res) => {
      await accounts.confirmReset(req.body.token, req.body.newPassword);
      res.status(204).end();
    });
}
