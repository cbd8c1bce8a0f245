import { type DynamicModule, Global, Module } from '@nestjs/common';
import { type AppConfig } from './app-config.js';

export const APP_CONFIG = Symbol('APP_CONFIG');

/** Resolved settings; `jwtSecret` is always set once the app is built. */
export type ResolvedConfig = AppConfig & { jwtSecret: string };

@Global()
@Module({})
export class ConfigModule {
  static forRoot(config: ResolvedConfig): DynamicModule {
    return { module: ConfigModule, providers: [{ provide: APP_CONFIG, useValue: config }], exports: [APP_CONFIG] };
  }
}
