import { randomBytes } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { JwtService } from '@nestjs/jwt';
import { type NestExpressApplication } from '@nestjs/platform-express';
import { type Role, type SignInResponse } from '@limitbook/contracts';
import { count, desc, getTableName, is } from 'drizzle-orm';
import { PgTable } from 'drizzle-orm/pg-core';
import pg from 'pg';
import supertest from 'supertest';
import { inject } from 'vitest';
import { type AppOptions } from '../app.module.js';
import { createApp } from '../app.setup.js';
import { loadConfig } from '../config/app-config.js';
import { type ResolvedConfig } from '../config/config.module.js';
import { workspaceRoot } from '../config/workspace-paths.js';
import { type Database, type DatabaseHandle, wrapPglite, wrapPostgres } from '../database/database.js';
import * as schema from '../database/schema/index.js';
import { type CapturedMailRow } from '../database/schema/index.js';
import { MailService } from '../modules/mail/mail.service.js';
import { readDemoPeople } from '../modules/users/users.seed.js';

export interface TestAppOptions {
  /** Extra environment variables, parsed like the real ones (e.g. `{ LIMITBOOK_AUTH_RATE_LIMIT: '3' }`). */
  env?: Record<string, string>;
  /** Extra modules to load beside the AppModule's own (test-only controllers). */
  imports?: AppOptions['imports'];
  /** Nest log levels to print; errors only by default. */
  logLevels?: ('log' | 'error' | 'warn' | 'debug' | 'verbose' | 'fatal')[];
}

export interface DemoSession extends SignInResponse {
  /** The `limitbook_refresh=…` cookie pair, ready for a `Cookie` header. */
  refreshCookie: string;
}

export interface TestApp {
  app: NestExpressApplication;
  /** Supertest bound to the app's HTTP server. Send tokens yourself: `.set('Authorization', `Bearer ${token}`)`. */
  http: ReturnType<typeof supertest>;
  db: Database;
  driver: DatabaseHandle['driver'];
  config: ResolvedConfig;
  /** Signs in the demo person holding `role` and returns their access token. */
  signIn(role: Role): Promise<string>;
  /** Like signIn, with the whole response and the refresh cookie. */
  session(role: Role): Promise<DemoSession>;
  /** The demo person's credentials for `role`, from content/demo/people.json. */
  demoPerson(role: Role): { email: string; password: string; name: string };
  /** An access token for any user id, valid or expired (`expiresInSeconds` < 0), signed with the app's secret. */
  tokenFor(userId: string, expiresInSeconds?: number): string;
  /** Waits for mail still being sent, then returns caught messages (newest first), optionally to one address. */
  readMail(to?: string): Promise<CapturedMailRow[]>;
  /** Rows per table, for asserting that a refused request wrote nothing. */
  rowCounts(): Promise<Record<string, number>>;
  close(): Promise<void>;
}

function pgliteTemplate(): string | undefined {
  try {
    return inject('pgliteTemplate');
  } catch {
    return undefined;
  }
}

async function openTestDatabase(): Promise<{ handle: DatabaseHandle; dispose: () => Promise<void> }> {
  const serverUrl = process.env.LIMITBOOK_TEST_DATABASE_URL;
  if (serverUrl) {
    // A database of its own per test app, dropped afterwards: test files run in parallel.
    const name = `limitbook_test_${randomBytes(6).toString('hex')}`;
    const admin = new pg.Client({ connectionString: serverUrl });
    await admin.connect();
    await admin.query(`create database ${name}`);
    await admin.end();
    const url = new URL(serverUrl);
    url.pathname = `/${name}`;
    const handle = wrapPostgres(new pg.Pool({ connectionString: url.toString(), max: 5 }));
    return {
      handle,
      dispose: async () => {
        const dropper = new pg.Client({ connectionString: serverUrl });
        await dropper.connect();
        await dropper.query(`drop database if exists ${name} with (force)`);
        await dropper.end();
      },
    };
  }
  const template = pgliteTemplate();
  const client = await PGlite.create(template ? { loadDataDir: new Blob([readFileSync(template)]) } : {});
  return { handle: wrapPglite(client), dispose: async () => undefined };
}

/**
 * Boots the real AppModule over HTTP on a fresh database: in-memory PGlite (from a migrated
 * template when run under the api's vitest config), or a throwaway database on the server
 * named by LIMITBOOK_TEST_DATABASE_URL. The demo people are seeded; mail goes through the
 * real in-process SMTP catcher.
 */
export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const root = workspaceRoot();
  const dataDir = await mkdtemp(join(tmpdir(), 'limitbook-test-'));
  const loaded = loadConfig(
    {
      PORT: '0',
      LIMITBOOK_DATA_DIR: dataDir,
      LIMITBOOK_CONTENT_DIR: join(root, 'content'),
      LIMITBOOK_WEB_DIST: join(dataDir, 'no-web-app'),
      PUBLIC_URL: 'http://limitbook.test',
      LIMITBOOK_AUTH_RATE_LIMIT: '10000',
      ...options.env,
    },
    root,
  );
  const config: ResolvedConfig = { ...loaded, jwtSecret: loaded.jwtSecret ?? randomBytes(32).toString('hex') };
  const { handle, dispose } = await openTestDatabase();

  let app: NestExpressApplication;
  try {
    app = await createApp(
      {
        config,
        database: async () => {
          await handle.migrate(config.migrationsDir);
          return handle;
        },
        seedOnBoot: true,
        imports: options.imports,
      },
      options.logLevels ?? ['error'],
    );
    await app.init();
  } catch (error) {
    await handle.close().catch(() => undefined);
    await dispose();
    throw error;
  }

  const http = supertest(app.getHttpServer());
  const demo = await readDemoPeople(config.contentDir);
  const jwt = app.get(JwtService);

  const demoPerson = (role: Role) => {
    const person = demo.people.find((entry) => entry.role === role);
    if (!person) throw new Error(`No demo person has the ${role} role`);
    return person;
  };

  const session = async (role: Role): Promise<DemoSession> => {
    const person = demoPerson(role);
    const response = await http.post('/api/auth/sign-in').send({ email: person.email, password: person.password });
    if (response.status !== 200) throw new Error(`Demo sign-in as ${role} failed: ${response.status} ${JSON.stringify(response.body)}`);
    const cookie = ([response.headers['set-cookie']].flat() as string[]).find((line) => line.startsWith('limitbook_refresh='));
    return { ...(response.body as SignInResponse), refreshCookie: cookie?.split(';')[0] ?? '' };
  };

  return {
    app,
    http,
    db: handle.db,
    driver: handle.driver,
    config,
    demoPerson,
    session,
    signIn: async (role) => (await session(role)).accessToken,
    tokenFor: (userId, expiresInSeconds = 60) => jwt.sign({ sub: userId }, { expiresIn: expiresInSeconds }),
    readMail: async (to) => {
      await app.get(MailService).flush();
      const rows = await handle.db.select().from(schema.capturedMail).orderBy(desc(schema.capturedMail.receivedAt));
      return to ? rows.filter((row) => row.to.some((address) => address.toLowerCase() === to.toLowerCase())) : rows;
    },
    rowCounts: async () => {
      const counts: Record<string, number> = {};
      for (const table of Object.values(schema)) {
        if (!is(table, PgTable)) continue;
        const [row] = await handle.db.select({ n: count() }).from(table);
        counts[getTableName(table)] = row?.n ?? 0;
      }
      return counts;
    },
    close: async () => {
      await app.close();
      await dispose();
      await rm(dataDir, { recursive: true, force: true });
    },
  };
}
