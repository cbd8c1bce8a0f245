import { type DynamicModule, Global, Module } from '@nestjs/common';
import { SeedRegistry } from './seed.registry.js';
import { SeedRepository } from './seed.repository.js';
import { SEED_ON_BOOT, SeedService } from './seed.service.js';

@Global()
@Module({})
export class SeedModule {
  /** `seedOnBoot` loads the first accounts when the database is empty; `--seed` turns it off and runs the steps itself. */
  static forRoot(options: { seedOnBoot: boolean }): DynamicModule {
    return {
      module: SeedModule,
      providers: [SeedRegistry, SeedRepository, SeedService, { provide: SEED_ON_BOOT, useValue: options.seedOnBoot }],
      exports: [SeedRegistry, SeedService],
    };
  }
}
