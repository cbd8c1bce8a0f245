import { createHash, randomBytes } from 'node:crypto';

/** 256 random bits, URL-safe: for refresh cookies and links in mail. */
export function newOpaqueToken(): string {
  return randomBytes(32).toString('base64url');
}

/** Tokens are high-entropy, so a fast hash is enough to keep a database leak from yielding usable tokens. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
