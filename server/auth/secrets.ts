/**
 * One-time secrets (API tokens, invitation and reset links): random, shown
 * once, stored only as a SHA-256 hash. A fast hash is right here because the
 * secret has 256 bits of entropy; passwords use bcrypt instead.
 */
import { createHash, randomBytes } from 'node:crypto';

const SECRET_BYTES = 32;

export function newSecret(prefix = ''): string {
  return `${prefix}${randomBytes(SECRET_BYTES).toString('base64url')}`;
}

export function hashSecret(secret: string): string {
  return createHash('sha256').update(secret).digest('hex');
}
