/** Password hashing. Plain passwords pass through here only; they are never stored or logged. */
import argon2 from 'argon2';

/** OWASP Password Storage Cheat Sheet, argon2id minimum: 19 MiB of memory, 2 iterations, 1 lane. */
export const ARGON2_OPTIONS = { type: argon2.argon2id, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, ARGON2_OPTIONS);
}

let dummyHash: Promise<string> | undefined;

/**
 * True when the password matches the hash. Without a hash (no such account) it still runs a full
 * verification against a dummy, so an unknown e-mail takes as long as a wrong password.
 */
export async function verifyPassword(hash: string | undefined, password: string): Promise<boolean> {
  dummyHash ??= hashPassword('a password no account has');
  const matches = await argon2.verify(hash ?? (await dummyHash), password);
  return hash !== undefined && matches;
}
