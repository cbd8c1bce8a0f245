import { createHmac, timingSafeEqual } from 'node:crypto';

/** How long a signed file address works: at least an hour, at most two. */
export const signedUrlWindowSeconds = 3600;

export interface FileSignature {
  fileId: string;
  userId: string;
  /** Unix seconds. */
  expires: number;
}

/**
 * Signed addresses let `<img>` and download links, which cannot send a bearer token, fetch
 * a file. Each is bound to one file and one user (checked to be still active when used) and
 * expires; the key is derived from the JWT secret, so it is not an access token.
 */
export class FileUrlSigner {
  private readonly key: Buffer;

  constructor(secret: string) {
    this.key = createHmac('sha256', secret).update('limitbook:signed-file-url:v1').digest();
  }

  /** Expiry is rounded up to the next whole hour, so a page shows the same addresses for a while and browsers can cache them. */
  expiryFrom(nowSeconds: number): number {
    return (Math.floor(nowSeconds / signedUrlWindowSeconds) + 2) * signedUrlWindowSeconds;
  }

  sign({ fileId, userId, expires }: FileSignature): string {
    return createHmac('sha256', this.key).update(`${fileId}.${userId}.${expires}`).digest('base64url');
  }

  verify(signature: FileSignature, sig: string, nowSeconds: number): boolean {
    if (signature.expires < nowSeconds) return false;
    const expected = Buffer.from(this.sign(signature));
    const given = Buffer.from(sig);
    return expected.length === given.length && timingSafeEqual(expected, given);
  }

  url(fileId: string, userId: string, nowSeconds: number): string {
    const expires = this.expiryFrom(nowSeconds);
    const sig = this.sign({ fileId, userId, expires });
    return `/api/files/${fileId}/signed?u=${userId}&exp=${expires}&sig=${sig}`;
  }
}
