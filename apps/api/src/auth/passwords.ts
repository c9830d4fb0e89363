import bcrypt from 'bcryptjs';

// Compared against when the e-mail is unknown, so that a miss takes as long as a wrong password.
const DUMMY_HASH = bcrypt.hashSync('kerfmark-no-such-user', 10);

export function hashPassword(password: string, rounds: number): Promise<string> {
  return bcrypt.hash(password, rounds);
}

export function verifyPassword(password: string, hash: string | undefined): Promise<boolean> {
  return bcrypt.compare(password, hash ?? DUMMY_HASH);
}
