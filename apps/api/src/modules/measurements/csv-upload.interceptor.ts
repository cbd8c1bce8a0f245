import { type CallHandler, type ExecutionContext, Injectable, type NestInterceptor } from '@nestjs/common';
import { maxTableImportBytes } from '@limitbook/contracts';
import { type Request, type Response } from 'express';
import multer from 'multer';
import { type Observable } from 'rxjs';
import { MeasurementsException } from './measurements.exception.js';

/**
 * Reads one multipart field `file` into memory, within the table-import limit (smaller than
 * general uploads: a CSV is parsed inline). Runs after the guards, so a refused caller's body is never read.
 */
@Injectable()
export class CsvUploadInterceptor implements NestInterceptor {
  private readonly single = multer({
    storage: multer.memoryStorage(),
    defParamCharset: 'utf8',
    limits: { fileSize: maxTableImportBytes, files: 1, fields: 5, parts: 6, fieldSize: 1024 },
  }).single('file');

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    const http = context.switchToHttp();
    await new Promise<void>((resolve, reject) => {
      this.single(http.getRequest<Request>(), http.getResponse<Response>(), (error: unknown) => {
        if (!error) return resolve();
        if (error instanceof multer.MulterError) {
          if (error.code === 'LIMIT_FILE_SIZE') return reject(MeasurementsException.of('too-large'));
          return reject(MeasurementsException.of('too-many-parts'));
        }
        reject(error instanceof Error && /multipart|boundary/i.test(error.message) ? MeasurementsException.of('no-file') : error);
      });
    });
    return next.handle();
  }
}
