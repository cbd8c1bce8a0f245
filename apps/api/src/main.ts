import 'reflect-metadata';
import { mkdirSync } from 'node:fs';
import { Logger } from '@nestjs/common';
import { createApp } from './app.setup.js';
import { ConfigError, loadConfig } from './config/app-config.js';
import { resolveJwtSecret } from './config/jwt-secret.js';
import { openConfiguredDatabase } from './database/open-database.js';
import { SeedService } from './seed/seed.service.js';

async function bootstrap(): Promise<void> {
  let loaded;
  try {
    loaded = loadConfig();
  } catch (error) {
    if (error instanceof ConfigError) {
      console.error(error.message);
      process.exit(1);
    }
    throw error;
  }
  mkdirSync(loaded.dataDir, { recursive: true });
  const config = { ...loaded, jwtSecret: resolveJwtSecret(loaded.jwtSecret, loaded.dataDir) };
  const seedOnly = process.argv.includes('--seed');

  const app = await createApp({ config, database: () => openConfiguredDatabase(config), seedOnBoot: !seedOnly });
  if (seedOnly) {
    await app.init();
    await app.get(SeedService).run('reload');
    await app.close();
    return;
  }
  app.enableShutdownHooks();
  await app.listen(config.port);
  new Logger('Limitbook').log(`Listening on http://localhost:${config.port} (API under /api, reference at /api/docs)`);
}

bootstrap().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
