// Password hashing in one place: the cost, and a compare that costs the same whether or not
// there is a stored hash, so an unknown e-mail cannot be told from a known one by time.
import bcrypt from 'bcryptjs';
import { env } from '../env';

export const BCRYPT_ROUNDS = env.BCRYPT_ROUNDS ?? (env.NODE_ENV === 'test' ? 4 : 11);

// Compared against when there is no stored hash, at the cost of real hashes. Computed once, in
// the background, at start.
const DUMMY_HASH = bcrypt.hash('not-a-real-password', BCRYPT_ROUNDS);

export const hashPassword = (password: string) => bcrypt.hash(password, BCRYPT_ROUNDS);

/** Whether the password matches the hash; with no hash, false after the same bcrypt work. */
export async function checkPassword(password: string, hash: string | null): Promise<boolean> {
  const ok = await bcrypt.compare(password, hash ?? (await DUMMY_HASH));
  return ok && hash !== null;
}

/** A hash made at another cost than today's (rehash it while the password is at hand). */
export const needsRehash = (hash: string) => bcrypt.getRounds(hash) !== BCRYPT_ROUNDS;
