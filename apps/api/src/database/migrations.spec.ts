import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { sql } from 'drizzle-orm';
import { generateDrizzleJson, generateMigration } from 'drizzle-kit/api';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { defaultMigrationsDir } from '../config/workspace-paths.js';
import { createTestApp, type TestApp } from '../testing/test-app.js';
import { DATABASE_HANDLE } from './database.module.js';
import { type DatabaseHandle } from './database.js';
import * as schema from './schema/index.js';

const migrationsDir = defaultMigrationsDir();

describe('migrations', () => {
  it('match the Drizzle schema: nothing left to generate', async () => {
    const snapshots = readdirSync(join(migrationsDir, 'meta'))
      .filter((name) => name.endsWith('_snapshot.json'))
      .sort();
    const latest = JSON.parse(readFileSync(join(migrationsDir, 'meta', snapshots.at(-1)!), 'utf8'));
    const current = generateDrizzleJson(schema as Record<string, unknown>, latest.id);
    const pending = await generateMigration(latest, current);
    expect(pending, 'Run `npm run db:generate` and commit the new migration').toEqual([]);
  });

  describe('applied to a database', () => {
    let t: TestApp;
    beforeAll(async () => {
      t = await createTestApp();
    });
    afterAll(async () => {
      await t?.close();
    });

    it('create every table of the schema and can run again without changes', async () => {
      const handle = t.app.get<DatabaseHandle>(DATABASE_HANDLE);
      await handle.migrate(migrationsDir);
      const tables = await t.db.execute(sql`select table_name from information_schema.tables where table_schema = 'public' order by table_name`);
      const names = (tables as unknown as { rows: { table_name: string }[] }).rows.map((row) => row.table_name);
      expect(names).toEqual(expect.arrayContaining(Object.keys(await t.rowCounts())));
      const journal = JSON.parse(readFileSync(join(migrationsDir, 'meta', '_journal.json'), 'utf8')) as { entries: unknown[] };
      const applied = await t.db.execute(sql`select count(*)::int as n from drizzle.__drizzle_migrations`);
      expect((applied as unknown as { rows: { n: number }[] }).rows[0]!.n).toBe(journal.entries.length);
    });
  });
});
