import { createSecretKey } from 'node:crypto';
import type { Knex } from 'knex';
import passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import type { OrgKind, Role } from '@kerfmark/contracts';
import { User } from '../models';
import { JWT_ALGORITHM, JWT_ISSUER, type TokenClaims } from './tokens';

/** The signed-in user as every route sees it. Role and organisation are read fresh each request. */
export interface AuthUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  organisationId: number;
  orgKind: OrgKind;
  timeZone: string;
  jti: string;
  tokenExpiresAt: Date;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends AuthUser {}
  }
}

export function createPassport(secret: string, knex: Knex): passport.PassportStatic {
  const instance = new passport.Passport() as unknown as passport.PassportStatic;
  instance.use(
    new JwtStrategy(
      {
        jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
        // A key object made once: given the string, jsonwebtoken would build one on every verify.
        secretOrKey: createSecretKey(Buffer.from(secret)) as unknown as string,
        algorithms: [JWT_ALGORITHM],
        issuer: JWT_ISSUER,
      },
      (claims: TokenClaims, done: (error: unknown, user?: AuthUser | false) => void) => {
        void (async () => {
          const revoked = await knex('revoked_tokens').where({ jti: claims.jti }).first();
          if (revoked) return done(null, false);
          const user = await User.query().findById(Number(claims.sub)).withGraphJoined('organisation');
          if (!user || user.status !== 'active' || !user.organisation) return done(null, false);
          done(null, {
            id: user.id,
            email: user.email,
            name: user.name,
            role: user.role,
            organisationId: user.organisationId,
            orgKind: user.organisation.kind,
            timeZone: user.organisation.timeZone,
            jti: claims.jti,
            tokenExpiresAt: new Date(claims.exp * 1000),
          });
        })().catch(done);
      },
    ),
  );
  return instance;
}
