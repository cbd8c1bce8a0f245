import { createHash, createHmac, randomBytes } from 'node:crypto';

/** 256 random bits, URL-safe: for refresh cookies and links in mail. */
export function newOpaqueToken(): string {
  return randomBytes(32).toString('base64url');
}

/** Tokens are high-entropy, so a fast hash is enough to keep a database leak from yielding usable tokens. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/**
 * The refresh token that replaces `token` on rotation: HMAC-derived rather than random, so a
 * request that presents `token` again during the grace window can be handed the same successor
 * without the database ever holding a usable token.
 */
export function successorToken(token: string, key: Buffer): string {
  return createHmac('sha256', key).update(token).digest('base64url');
}

/** A key for successorToken, separate from the JWT signing key it is derived from. */
export function successorKey(secret: string): Buffer {
  return createHmac('sha256', secret).update('limitbook refresh-token successor v1').digest();
}
