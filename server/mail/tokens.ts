import { createHash, randomBytes } from 'node:crypto';

/**
 * Link tokens (invitations, password resets, share links): 32 random bytes (256 bits) as base64url; only
 * their SHA-256 is stored, so a database leak does not leak working links (OWASP Forgot Password Cheat Sheet:
 * random, long, single-use, expiring, stored securely).
 */
export function newLinkToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** A syntactically possible token (43 base64url characters); anything else is rejected before a lookup. */
export function isLinkTokenShape(token: unknown): token is string {
  return typeof token === 'string' && /^[A-Za-z0-9_-]{43}$/.test(token);
}

export const HOUR_MS = 60 * 60 * 1000;
export const DAY_MS = 24 * HOUR_MS;
