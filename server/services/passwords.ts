import bcrypt from 'bcryptjs';
import { config } from '../config';

/** bcrypt with the configured work factor (OWASP: at least 10; 12 by default). */
export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, Math.max(10, config.bcryptRounds));
}

/** Compares in constant time through bcrypt. */
export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

// A hash to compare against when the e-mail is unknown, so timing does not tell who has an account.
let dummy: Promise<string> | null = null;
/** Spends the same time as a real check for an unknown account. */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummy ??= hashPassword('not-a-real-password-for-timing');
  await bcrypt.compare(password, await dummy);
}
