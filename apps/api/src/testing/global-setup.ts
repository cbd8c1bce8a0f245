import { rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { type TestProject } from 'vitest/node';
import { defaultMigrationsDir } from '../config/workspace-paths.js';
import { wrapPglite } from '../database/database.js';

declare module 'vitest' {
  export interface ProvidedContext {
    /** A migrated PGlite data folder as a tar file; each test app starts from a copy. */
    pgliteTemplate: string | undefined;
  }
}

/** Running initdb and the migrations once per run instead of once per test file saves seconds per file. */
export default async function setup(project: TestProject): Promise<() => void> {
  if (process.env.LIMITBOOK_TEST_DATABASE_URL) {
    project.provide('pgliteTemplate', undefined);
    return () => undefined;
  }
  const client = await PGlite.create();
  await wrapPglite(client).migrate(defaultMigrationsDir());
  const dump = await client.dumpDataDir('none');
  await client.close();
  const file = join(tmpdir(), `limitbook-pglite-template-${process.pid}-${Date.now()}.tar`);
  writeFileSync(file, Buffer.from(await dump.arrayBuffer()));
  project.provide('pgliteTemplate', file);
  return () => rmSync(file, { force: true });
}
