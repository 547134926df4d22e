/** Password hashing (bcryptjs). */
import bcrypt from 'bcryptjs';

/** bcrypt's work factor; 10 costs ≈70 ms per hash here, enough against offline guessing for a team tool. */
const BCRYPT_ROUNDS = 10;
/** A hash of nothing anyone knows, compared against when the e-mail is unknown so both paths take as long. */
const UNKNOWN_USER_HASH = bcrypt.hashSync('linewright-no-such-user', BCRYPT_ROUNDS);

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_ROUNDS);
}

export async function isPasswordCorrect(password: string, hash: string | null | undefined): Promise<boolean> {
  const matches = await bcrypt.compare(password, hash ?? UNKNOWN_USER_HASH);
  return matches && Boolean(hash);
}
