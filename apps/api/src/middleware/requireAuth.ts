import type { RequestHandler } from 'express';
import type passport from 'passport';
import { HttpError } from '../lib/httpError';

/** Accepts a valid, unrevoked bearer token; anything else is a 401 asking to sign in again. */
export function requireAuth(instance: passport.PassportStatic): RequestHandler {
  return (req, res, next) => {
    // Routers mounted on overlapping paths each ask for auth: check the token once per request.
    if (req.user) return next();
    instance.authenticate('jwt', { session: false }, (error: unknown, user: Express.User | false, info?: Error) => {
      if (error) return next(error);
      if (!user) {
        const expired = info?.name === 'TokenExpiredError';
        return next(
          new HttpError(
            401,
            expired ? 'token_expired' : 'unauthorised',
            expired ? 'Your session has expired. Sign in again.' : 'Sign in to continue.',
          ),
        );
      }
      req.user = user;
      next();
    })(req, res, next);
  };
}
