import { type CallHandler, type ExecutionContext, Injectable, type NestInterceptor } from '@nestjs/common';
import { maxUploadBytes } from '@limitbook/contracts';
import { type Request, type Response } from 'express';
import multer from 'multer';
import { type Observable } from 'rxjs';
import { FilesException } from './files.exception.js';

/**
 * Reads one multipart file field named `file` into memory, within the size limit. Runs after
 * the guards, so nobody unauthorised gets a request body read.
 */
@Injectable()
export class UploadInterceptor implements NestInterceptor {
  private readonly single = multer({
    storage: multer.memoryStorage(),
    // Browsers send UTF-8 file names; multer would read them as Latin-1.
    defParamCharset: 'utf8',
    limits: { fileSize: maxUploadBytes, files: 1, fields: 5, parts: 6, fieldSize: 1024 },
  }).single('file');

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    const http = context.switchToHttp();
    await new Promise<void>((resolve, reject) => {
      this.single(http.getRequest<Request>(), http.getResponse<Response>(), (error: unknown) => {
        if (!error) return resolve();
        if (error instanceof multer.MulterError) {
          if (error.code === 'LIMIT_FILE_SIZE') return reject(FilesException.of('too-large'));
          return reject(FilesException.of('too-many-parts'));
        }
        reject(error instanceof Error && /multipart|boundary/i.test(error.message) ? FilesException.of('no-file') : error);
      });
    });
    return next.handle();
  }
}
