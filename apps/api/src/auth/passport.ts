import { createSecretKey } from 'node:crypto';
import type { Knex } from 'knex';
import passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import type { OrgKind, Role, ShopCapabilities } from '@kerfmark/contracts';
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
  orgPostcode: string | null;
  /** A die shop's stated capabilities (what the board's "dies we can make" filter reads); null for a printer. */
  shopCapabilities: ShopCapabilities | null;
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

interface SignedInRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  status: string;
  organisationId: number;
  orgKind: OrgKind;
  timeZone: string;
  orgPostcode: string | null;
  dieKinds: ShopCapabilities['dieKinds'];
  ruleHeightsIn: Array<number | string>;
  maxBoardWidthIn: number | null;
  maxBoardLengthIn: number | null;
  makesCounters: boolean | null;
  fitsEjectionRubber: boolean | null;
  revoked: boolean;
}
// Raw results skip the snake-case mappers, hence the quoted camelCase names.
const SIGNED_IN_SQL = `
  select u.id, u.email, u.name, u.role, u.status, u.organisation_id as "organisationId", o.kind as "orgKind", o.time_zone as "timeZone", o.postcode as "orgPostcode",
    o.die_kinds as "dieKinds", o.rule_heights_in as "ruleHeightsIn", o.max_board_width_in as "maxBoardWidthIn",
    o.max_board_length_in as "maxBoardLengthIn", o.makes_counters as "makesCounters",
    o.fits_ejection_rubber as "fitsEjectionRubber",
    exists (select 1 from revoked_tokens where jti = ?) as revoked
  from users u join organisations o on o.id = u.organisation_id
  where u.id = ?`;

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
          // One round trip per request: the user, the organisation and whether the token was
          // revoked. Plain SQL, as it runs before every route.
          const { rows } = await knex
            .raw<{ rows: SignedInRow[] }>(SIGNED_IN_SQL, [claims.jti, Number(claims.sub)])
            .options({ prepare: true });
          const user = rows[0];
          if (!user || user.revoked || user.status !== 'active') return done(null, false);
          done(null, {
            id: user.id,
            email: user.email,
            name: user.name,
            role: user.role,
            organisationId: user.organisationId,
            orgKind: user.orgKind,
            timeZone: user.timeZone,
            orgPostcode: user.orgPostcode,
            shopCapabilities: user.orgKind === 'die_shop' ? capabilitiesOf(user) : null,
            jti: claims.jti,
            tokenExpiresAt: new Date(claims.exp * 1000),
          });
        })().catch(done);
      },
    ),
  );
  return instance;
}

/** The capabilities columns, with the rule heights as numbers (a numeric array arrives as text). */
function capabilitiesOf(row: SignedInRow): ShopCapabilities {
  return {
    dieKinds: row.dieKinds,
    ruleHeightsIn: row.ruleHeightsIn.map(Number),
    maxBoardWidthIn: row.maxBoardWidthIn,
    maxBoardLengthIn: row.maxBoardLengthIn,
    makesCounters: row.makesCounters,
    fitsEjectionRubber: row.fitsEjectionRubber,
  };
}
