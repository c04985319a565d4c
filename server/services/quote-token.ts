/** The customer's quote link token: 32 random bytes, base64url; only its SHA-256 is stored. */
import { createHash, randomBytes } from 'node:crypto';

export function hashQuoteToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

export function newQuoteToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashQuoteToken(token) };
}
