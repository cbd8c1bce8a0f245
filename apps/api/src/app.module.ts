import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { type DynamicModule, Inject, Injectable, Logger, Module, type OnApplicationBootstrap, type Type } from '@nestjs/common';
import { APP_FILTER } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { AllExceptionsFilter } from './common/errors/all-exceptions.filter.js';
import { ConfigModule, type ResolvedConfig } from './config/config.module.js';
import { DatabaseModule } from './database/database.module.js';
import { type DatabaseHandle } from './database/database.js';
import { AuditModule } from './modules/audit/audit.module.js';
import { AuthModule } from './modules/auth/auth.module.js';
import { DocsModule } from './modules/docs/docs.module.js';
import { FilesModule } from './modules/files/files.module.js';
import { HealthModule } from './modules/health/health.module.js';
import { LibraryModule } from './modules/library/library.module.js';
import { MailModule } from './modules/mail/mail.module.js';
import { MeasurementsModule } from './modules/measurements/measurements.module.js';
import { MethodDesignsModule } from './modules/method-designs/method-designs.module.js';
import { MethodsModule } from './modules/methods/methods.module.js';
import { RecordsModule } from './modules/records/records.module.js';
import { SearchModule } from './modules/search/search.module.js';
import { UsersModule } from './modules/users/users.module.js';
import { SeedModule } from './seed/seed.module.js';

export interface AppOptions {
  config: ResolvedConfig;
  /** Opens and migrates the database. */
  database: () => Promise<DatabaseHandle>;
  /** Load the first accounts when the database is empty (off for `--seed`, which runs the seeder itself). */
  seedOnBoot: boolean;
  /** Extra modules, e.g. a test-only controller. */
  imports?: (Type | DynamicModule)[];
}

const WEB_DIST = Symbol('WEB_DIST');

@Injectable()
class MissingWebAppNotice implements OnApplicationBootstrap {
  constructor(@Inject(WEB_DIST) private readonly webDist: string) {}

  onApplicationBootstrap(): void {
    new Logger('WebApp').warn(`No built web app in ${this.webDist}; serving the API only. Build it with \`npm run build\` or set LIMITBOOK_WEB_DIST.`);
  }
}

@Module({})
class MissingWebAppModule {}

function webAppModules(webDist: string): DynamicModule[] {
  if (!existsSync(join(webDist, 'index.html'))) {
    return [{ module: MissingWebAppModule, providers: [{ provide: WEB_DIST, useValue: webDist }, MissingWebAppNotice] }];
  }
  return [
    ServeStaticModule.forRoot({
      rootPath: webDist,
      // Missing hashed assets must 404: index.html served as JavaScript breaks the page in confusing ways.
      exclude: ['/api/{*path}', '/assets/{*path}'],
      serveStaticOptions: {
        index: false,
        setHeaders: (res, path) => {
          res.setHeader('Cache-Control', path.includes('/assets/') ? 'public, max-age=31536000, immutable' : 'no-cache');
        },
      },
    }),
  ];
}

@Module({})
export class AppModule {
  static forRoot(options: AppOptions): DynamicModule {
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot(options.config),
        DatabaseModule.forRoot({ open: options.database }),
        SeedModule.forRoot({ seedOnBoot: options.seedOnBoot }),
        MailModule,
        AuditModule,
        AuthModule,
        UsersModule,
        HealthModule,
        MethodsModule,
        MeasurementsModule,
        MethodDesignsModule,
        LibraryModule,
        FilesModule,
        SearchModule,
        RecordsModule,
        DocsModule,
        ...webAppModules(options.config.webDist),
        ...(options.imports ?? []),
      ],
      providers: [{ provide: APP_FILTER, useClass: AllExceptionsFilter }],
    };
  }
}
