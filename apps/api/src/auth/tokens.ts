import { randomUUID } from 'node:crypto';
import jwt from 'jsonwebtoken';

export interface TokenClaims {
  sub: string;
  jti: string;
  exp: number;
}

export const JWT_ALGORITHM = 'HS256';
export const JWT_ISSUER = 'kerfmark';

/** Signs a session token for a user; its jti lets sign-out revoke exactly this token. */
export function signToken(userId: number, secret: string, ttlSeconds: number): { token: string; expiresAt: Date } {
  const token = jwt.sign({ sub: String(userId) }, secret, {
    algorithm: JWT_ALGORITHM,
    expiresIn: ttlSeconds,
    issuer: JWT_ISSUER,
    jwtid: randomUUID(),
  });
  const { exp } = jwt.decode(token) as TokenClaims;
  return { token, expiresAt: new Date(exp * 1000) };
}
