import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from './app-config.js';
import { resolveJwtSecret } from './jwt-secret.js';

describe('loadConfig', () => {
  it('defaults to PGlite in ./data under the working directory, port 3000', () => {
    const config = loadConfig({}, '/srv/limitbook');
    expect(config).toMatchObject({
      port: 3000,
      dataDir: '/srv/limitbook/data',
      contentDir: '/srv/limitbook/content',
      database: { driver: 'pglite', dataDir: '/srv/limitbook/data/pglite' },
      publicUrl: 'http://localhost:3000',
      seedDemo: true,
      bootstrapAdmin: undefined,
      smtpUrl: undefined,
      jwtSecret: undefined,
    });
  });

  it('switches to a PostgreSQL server with DATABASE_URL and reads the rest', () => {
    const config = loadConfig(
      {
        PORT: '3100',
        DATABASE_URL: 'postgres://lb:pw@db.internal:5432/limitbook',
        PUBLIC_URL: 'https://limits.example.com/',
        LIMITBOOK_SEED_DEMO: 'false',
        LIMITBOOK_ADMIN_EMAIL: 'Owner@Example.com',
        LIMITBOOK_ADMIN_PASSWORD: 'a long admin passphrase',
      },
      '/srv',
    );
    expect(config.database).toEqual({ driver: 'postgres', url: 'postgres://lb:pw@db.internal:5432/limitbook' });
    expect(config.publicUrl).toBe('https://limits.example.com');
    expect(config.seedDemo).toBe(false);
    expect(config.bootstrapAdmin).toEqual({ email: 'owner@example.com', password: 'a long admin passphrase' });
  });

  it('lists every bad variable at once', () => {
    let error: unknown;
    try {
      loadConfig({ PORT: 'eighty', DATABASE_URL: 'mysql://x', JWT_SECRET: 'short', LIMITBOOK_ADMIN_EMAIL: 'admin@example.com', LIMITBOOK_SEED_DEMO: 'maybe' });
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(ConfigError);
    const problems = (error as ConfigError).problems.join('\n');
    for (const name of ['PORT', 'DATABASE_URL', 'JWT_SECRET', 'LIMITBOOK_SEED_DEMO']) expect(problems).toContain(name);
  });

  it('reads the refresh reuse grace window, 20 s unless set, 0 for strict rotation', () => {
    expect(loadConfig({}).refreshReuseGraceSeconds).toBe(20);
    expect(loadConfig({ LIMITBOOK_REFRESH_REUSE_GRACE_SECONDS: '0' }).refreshReuseGraceSeconds).toBe(0);
    expect(() => loadConfig({ LIMITBOOK_REFRESH_REUSE_GRACE_SECONDS: '-1' })).toThrow(/LIMITBOOK_REFRESH_REUSE_GRACE_SECONDS/);
    expect(() => loadConfig({ LIMITBOOK_REFRESH_REUSE_GRACE_SECONDS: '3600' })).toThrow(/LIMITBOOK_REFRESH_REUSE_GRACE_SECONDS/);
  });

  it("maps LIMITBOOK_TRUST_PROXY to Express's trust proxy setting", () => {
    const trust = (value?: string) => loadConfig(value === undefined ? {} : { LIMITBOOK_TRUST_PROXY: value }).trustProxy;
    expect(trust()).toBe(false);
    expect(trust('')).toBe(false);
    expect(trust('false')).toBe(false);
    expect(trust('TRUE')).toBe(true);
    expect(trust('2')).toBe(2);
    expect(trust('loopback')).toEqual(['loopback']);
    expect(trust(' loopback, 10.0.0.0/8 ,192.168.1.4, fd00::/8, 172.16.0.0/255.240.0.0')).toEqual([
      'loopback',
      '10.0.0.0/8',
      '192.168.1.4',
      'fd00::/8',
      '172.16.0.0/255.240.0.0',
    ]);
    for (const bad of ['yes', '10.0.0.0/33', '10.0.0.0/255.0.255.0', 'proxy.internal', '10.0.0.1/8/8', ',', '1.5']) {
      expect(() => trust(bad), bad).toThrow(/LIMITBOOK_TRUST_PROXY/);
    }
  });

  it('needs the admin e-mail and password together', () => {
    expect(() => loadConfig({ LIMITBOOK_ADMIN_EMAIL: 'admin@example.com' })).toThrow(/LIMITBOOK_ADMIN_PASSWORD/);
  });
});

describe('resolveJwtSecret', () => {
  let dir: string | undefined;
  afterEach(() => {
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('prefers the configured secret, else generates one and keeps it for the next start', () => {
    dir = mkdtempSync(join(tmpdir(), 'limitbook-secret-'));
    expect(resolveJwtSecret('x'.repeat(40), dir)).toBe('x'.repeat(40));
    const generated = resolveJwtSecret(undefined, dir);
    expect(generated.length).toBeGreaterThanOrEqual(32);
    expect(resolveJwtSecret(undefined, dir)).toBe(generated);
    expect(readFileSync(join(dir, 'jwt-secret'), 'utf8').trim()).toBe(generated);
  });
});
