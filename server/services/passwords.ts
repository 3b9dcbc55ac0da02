import crypto from 'node:crypto';
import bcrypt from 'bcryptjs';

/**
 * bcrypt reads only the first 72 bytes of its input; a long (or multibyte) password would be
 * silently truncated. Pre-hashing with SHA-256 (base64, 44 bytes) keeps every character significant.
 */
export function hashPasswordInput(password: string): string {
  return crypto.createHash('sha256').update(password.normalize('NFKC'), 'utf8').digest('base64');
}

export async function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(hashPasswordInput(password), cost);
}

export async function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(hashPasswordInput(password), hash);
}

/** A constant-cost comparison when the e-mail is unknown, so timing does not reveal accounts. */
const DUMMY_HASH = bcrypt.hashSync('soundframe-dummy', 10);
export async function burnPasswordCheck(password: string) {
  await bcrypt.compare(hashPasswordInput(password), DUMMY_HASH);
}
