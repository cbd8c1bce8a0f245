import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { APP_CONFIG, type ResolvedConfig } from '../config/config.module.js';
import { type SeedContext } from './seed-step.js';
import { SeedRegistry } from './seed.registry.js';
import { SeedRepository } from './seed.repository.js';

export const SEED_ON_BOOT = Symbol('SEED_ON_BOOT');

@Injectable()
export class SeedService implements OnApplicationBootstrap {
  private readonly logger = new Logger('Seed');

  constructor(
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
    @Inject(SEED_ON_BOOT) private readonly seedOnBoot: boolean,
    private readonly registry: SeedRegistry,
    private readonly repository: SeedRepository,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.seedOnBoot) return;
    if (await this.repository.isEmpty()) {
      this.logger.log('Empty database: loading the first accounts.');
      await this.run('first-start');
    }
    for (const step of this.registry.ordered()) {
      await step.announce?.({ config: this.config, logger: new Logger(`Seed:${step.name}`) });
    }
  }

  async run(mode: SeedContext['mode']): Promise<void> {
    for (const step of this.registry.ordered()) {
      const started = Date.now();
      await step.run({ mode, config: this.config, logger: new Logger(`Seed:${step.name}`) });
      this.logger.log(`${step.name} done in ${Date.now() - started} ms`);
    }
  }
}
