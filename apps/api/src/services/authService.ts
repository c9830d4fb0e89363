import type { LoginInput, LoginResult, Me } from '@kerfmark/contracts';
import type { AuthUser } from '../auth/passport';
import type { LoginLimiter } from '../auth/loginLimiter';
import { verifyPassword } from '../auth/passwords';
import { signToken } from '../auth/tokens';
import { HttpError } from '../lib/httpError';
import { readingStyle } from '../lib/readingStyle';
import { Organisation, User } from '../models';
import type { ServiceDeps } from './deps';

export function createAuthService({ config, knex }: ServiceDeps, limiter: LoginLimiter) {
  return {
    async login(input: LoginInput, ip: string): Promise<LoginResult> {
      const wait = await limiter.blockedFor(input.email, ip);
      if (wait > 0) {
        const minutes = Math.ceil(wait / 60);
        throw new HttpError(
          429,
          'too_many_attempts',
          `Too many sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`,
          undefined,
          { 'Retry-After': String(wait) },
        );
      }
      const user = await User.query().findOne({ email: input.email });
      const ok = await verifyPassword(input.password, user?.passwordHash, config.bcryptRounds);
      if (!user || !ok) {
        await limiter.recordFailure(input.email, ip);
        throw new HttpError(401, 'invalid_credentials', 'That e-mail and password do not match an account.');
      }
      if (user.status !== 'active') {
        throw new HttpError(403, 'account_disabled', 'This account is disabled. Ask your organisation’s admin.');
      }
      await limiter.recordSuccess(input.email, ip);
      await User.query().patch({ lastSignInAt: new Date() }).findById(user.id);
      const { token, expiresAt } = signToken(user.id, config.jwtSecret, config.tokenTtlSeconds);
      return { token, expiresAt: expiresAt.toISOString() };
    },

    /** Revokes this token until it would have expired anyway. */
    async logout(user: AuthUser): Promise<void> {
      await knex('revoked_tokens').insert({ jti: user.jti, expiresAt: user.tokenExpiresAt }).onConflict('jti').ignore();
      await knex('revoked_tokens').where('expiresAt', '<', new Date()).delete();
    },

    async me(user: AuthUser): Promise<Me> {
      const organisation = await Organisation.query().findById(user.organisationId).throwIfNotFound();
      const style = await readingStyle(knex, user.id);
      return {
        id: user.id,
        email: user.email,
        name: user.name,
        role: user.role,
        organisation: {
          id: organisation.id,
          name: organisation.name,
          kind: organisation.kind,
          timeZone: organisation.timeZone,
        },
        ...style,
      };
    },
  };
}
