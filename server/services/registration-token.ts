import { createHmac, timingSafeEqual } from 'node:crypto';
import { config } from '../config';

/**
 * The token in an attendee's links. It is an HMAC of the registration id with the server's
 * secret, so every e-mail can carry the same link without storing it, and it cannot be guessed.
 */
export function registrationToken(id: string): string {
  return createHmac('sha256', config.sessionSecret).update(`registration:${id}`).digest('base64url');
}

/** Does the token belong to this registration (compared in constant time)? */
export function tokenMatches(id: string, token: string): boolean {
  const want = Buffer.from(registrationToken(id));
  const got = Buffer.from(token);
  return want.length === got.length && timingSafeEqual(want, got);
}
