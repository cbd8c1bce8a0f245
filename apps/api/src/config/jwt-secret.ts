import { randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/**
 * Without JWT_SECRET a secret is generated once and kept in the data folder, so a restart
 * does not sign everyone out. Several processes behind a load balancer must share JWT_SECRET.
 */
export function resolveJwtSecret(configured: string | undefined, dataDir: string): string {
  if (configured) return configured;
  const file = join(dataDir, 'jwt-secret');
  try {
    const stored = readFileSync(file, 'utf8').trim();
    if (stored.length >= 32) return stored;
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
  }
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}
