import { Logger } from '@nestjs/common';
import { type AppConfig } from '../config/app-config.js';
import { type DatabaseHandle, openDatabase } from './database.js';

/** Opens the configured database and brings it to the latest migration. */
export async function openConfiguredDatabase(config: AppConfig): Promise<DatabaseHandle> {
  const logger = new Logger('Database');
  const handle = await openDatabase(config.database, { logger: config.logSql });
  try {
    await handle.migrate(config.migrationsDir);
  } catch (error) {
    await handle.close();
    throw error;
  }
  logger.log(config.database.driver === 'pglite' ? `PGlite in ${config.database.dataDir}, migrations applied` : 'PostgreSQL server, migrations applied');
  return handle;
}
