import { mkdirSync } from 'node:fs';
import { PGlite } from '@electric-sql/pglite';
import { type Logger as DrizzleLogger } from 'drizzle-orm';
import { type PgDatabase, type PgQueryResultHKT } from 'drizzle-orm/pg-core';
import { drizzle as drizzleNodePg } from 'drizzle-orm/node-postgres';
import { migrate as migrateNodePg } from 'drizzle-orm/node-postgres/migrator';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import pg from 'pg';
import { type DatabaseTarget } from '../config/app-config.js';
import * as schema from './schema/index.js';

/** One Drizzle type for both drivers; repositories depend on this, never on a driver. */
export type Database = PgDatabase<PgQueryResultHKT, typeof schema>;
export type Transaction = Parameters<Parameters<Database['transaction']>[0]>[0];
export type Executor = Database | Transaction;

export interface DatabaseHandle {
  db: Database;
  driver: 'pglite' | 'postgres';
  migrate(migrationsDir: string): Promise<void>;
  close(): Promise<void>;
}

export interface OpenOptions {
  logger?: DrizzleLogger | boolean;
}

export function wrapPglite(client: PGlite, options: OpenOptions = {}): DatabaseHandle {
  const db = drizzlePglite({ client, schema, logger: options.logger ?? false });
  return {
    db: db as unknown as Database,
    driver: 'pglite',
    migrate: async (migrationsFolder) => {
      await migratePglite(db, { migrationsFolder });
    },
    close: async () => {
      if (!client.closed) await client.close();
    },
  };
}

export function wrapPostgres(pool: pg.Pool, options: OpenOptions = {}): DatabaseHandle {
  const db = drizzleNodePg({ client: pool, schema, logger: options.logger ?? false });
  return {
    db: db as unknown as Database,
    driver: 'postgres',
    migrate: async (migrationsFolder) => {
      // Several API processes may start together against one server: let one migrate at a time.
      const client = await pool.connect();
      try {
        await client.query('select pg_advisory_lock(7104211)');
        await migrateNodePg(drizzleNodePg({ client, schema }), { migrationsFolder });
      } finally {
        await client.query('select pg_advisory_unlock(7104211)').catch(() => undefined);
        client.release();
      }
    },
    close: async () => {
      await pool.end();
    },
  };
}

export async function openDatabase(target: DatabaseTarget, options: OpenOptions = {}): Promise<DatabaseHandle> {
  if (target.driver === 'postgres') {
    return wrapPostgres(new pg.Pool({ connectionString: target.url, max: 10 }), options);
  }
  if (target.dataDir) mkdirSync(target.dataDir, { recursive: true });
  const client = await PGlite.create(target.dataDir ? { dataDir: target.dataDir } : {});
  return wrapPglite(client, options);
}
