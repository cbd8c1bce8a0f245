import { type Logger } from '@nestjs/common';
import { type ResolvedConfig } from '../config/config.module.js';

export interface SeedContext {
  /** `first-start`: the database had no users. `reload`: `--seed` asked to load the demo content again. */
  mode: 'first-start' | 'reload';
  config: ResolvedConfig;
  logger: Logger;
}

/** A module's share of the demo content. Steps run by ascending `order`; users come first (order 0–99). */
export interface SeedStep {
  name: string;
  order: number;
  run(context: SeedContext): Promise<void>;
  /** Runs at every start, after any seeding, to tell the person starting the server what they need (demo sign-ins). */
  announce?(context: Omit<SeedContext, 'mode'>): Promise<void>;
}
