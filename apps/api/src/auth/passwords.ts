import bcrypt from 'bcryptjs';

// Compared against when the e-mail is unknown, so that a miss takes as long as a wrong password:
// made at the cost real hashes are made at (the same BCRYPT_ROUNDS), once per cost.
const dummyHashes = new Map<number, string>();

/** The hash an unknown e-mail is checked against, at the given cost. */
export function dummyHash(rounds: number): string {
  let hash = dummyHashes.get(rounds);
  if (!hash) dummyHashes.set(rounds, (hash = bcrypt.hashSync('kerfmark-no-such-user', rounds)));
  return hash;
}

export function hashPassword(password: string, rounds: number): Promise<string> {
  return bcrypt.hash(password, rounds);
}

/** Checks a password against a user's hash, or against the dummy hash at `rounds` when there is no user. */
export function verifyPassword(password: string, hash: string | undefined, rounds: number): Promise<boolean> {
  return bcrypt.compare(password, hash ?? dummyHash(rounds));
}
