import { type NextFunction, type Request, type Response } from 'express';
import { type NestExpressApplication } from '@nestjs/platform-express';
import { NestFactory } from '@nestjs/core';
import cookieParser from 'cookie-parser';
import { documentLimits } from '@limitbook/editor-schema';
import swaggerUiDist from 'swagger-ui-dist';
import { AppModule, type AppOptions } from './app.module.js';
import { toErrorBody } from './common/errors/error-body.js';
import { GLOBAL_PREFIX } from './common/openapi/route-catalog.js';
import { type ResolvedConfig } from './config/config.module.js';
import { SWAGGER_ASSETS_PATH } from './modules/docs/docs.controller.js';

/**
 * Bytes of JSON a request may carry: the editor's page limit plus room for the fields around the
 * document (title, version, note), so a page over its limit gets the schema's specific 400 and only
 * a body well past it is cut off with 413 before it is parsed.
 */
export const JSON_BODY_LIMIT = documentLimits.maxJsonBytes + 256 * 1024;

/**
 * Everything main and the tests share. The app must be created with `bodyParser: false`:
 * the JSON parser is registered here with our size limit and our error shape.
 */
export function configureApp(app: NestExpressApplication, config: Pick<ResolvedConfig, 'trustProxy'>): NestExpressApplication {
  app.setGlobalPrefix(GLOBAL_PREFIX);
  app.disable('x-powered-by');
  // Decides whether req.ip (which the auth rate limit keys on) comes from X-Forwarded-For.
  app.set('trust proxy', config.trustProxy);
  app.use(cookieParser());
  app.useBodyParser('json', { limit: JSON_BODY_LIMIT });
  // Body-parser errors happen before Nest's filters see the request.
  app.use((error: unknown, _req: Request, res: Response, next: NextFunction) => {
    if (res.headersSent) return next(error);
    const body = toErrorBody(error);
    res.status(body.statusCode).json(body);
  });
  app.useStaticAssets(swaggerUiDist.getAbsoluteFSPath(), { prefix: SWAGGER_ASSETS_PATH, index: false });
  return app;
}

export async function createApp(options: AppOptions, logger?: false | ('log' | 'error' | 'warn' | 'debug' | 'verbose' | 'fatal')[]): Promise<NestExpressApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(options), {
    bodyParser: false,
    ...(logger !== undefined ? { logger } : {}),
  });
  return configureApp(app, options.config);
}
