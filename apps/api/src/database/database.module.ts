import { type DynamicModule, Global, Inject, Logger, Module, type OnApplicationShutdown } from '@nestjs/common';
import { type DatabaseHandle } from './database.js';

export const DATABASE_HANDLE = Symbol('DATABASE_HANDLE');
export const DRIZZLE = Symbol('DRIZZLE');

export interface DatabaseModuleOptions {
  /** Opens and migrates the database; main and the test helper pass their own. */
  open: () => Promise<DatabaseHandle>;
}

@Global()
@Module({})
export class DatabaseModule implements OnApplicationShutdown {
  private readonly logger = new Logger('Database');

  constructor(@Inject(DATABASE_HANDLE) private readonly handle: DatabaseHandle) {}

  static forRoot(options: DatabaseModuleOptions): DynamicModule {
    return {
      module: DatabaseModule,
      providers: [
        { provide: DATABASE_HANDLE, useFactory: options.open },
        { provide: DRIZZLE, useFactory: (handle: DatabaseHandle) => handle.db, inject: [DATABASE_HANDLE] },
      ],
      exports: [DATABASE_HANDLE, DRIZZLE],
    };
  }

  async onApplicationShutdown(): Promise<void> {
    await this.handle.close().catch((error: unknown) => this.logger.error(`Closing the database failed: ${String(error)}`));
  }
}
