import { type CallHandler, type ExecutionContext, type NestInterceptor, type Type } from '@nestjs/common';
import { type Request, type Response } from 'express';
import multer from 'multer';
import { type Observable } from 'rxjs';

/** The module's own errors for the ways an upload can be refused before its handler runs. */
export interface UploadRefusals {
  tooLarge: () => Error;
  tooManyParts: () => Error;
  noFile: () => Error;
}

/**
 * An interceptor class that reads one multipart field `file` into memory within `maxBytes`.
 * As an interceptor it runs after the guards, so an unauthorised caller's body is never read.
 */
export function singleFileUpload(maxBytes: number, refusals: UploadRefusals): Type<NestInterceptor> {
  return class SingleFileUploadInterceptor implements NestInterceptor {
    private readonly single = multer({
      storage: multer.memoryStorage(),
      // Browsers send UTF-8 file names; multer would read them as Latin-1.
      defParamCharset: 'utf8',
      limits: { fileSize: maxBytes, files: 1, fields: 5, parts: 6, fieldSize: 1024 },
    }).single('file');

    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      const http = context.switchToHttp();
      await new Promise<void>((resolve, reject) => {
        this.single(http.getRequest<Request>(), http.getResponse<Response>(), (error: unknown) => {
          if (!error) return resolve();
          if (error instanceof multer.MulterError) return reject(error.code === 'LIMIT_FILE_SIZE' ? refusals.tooLarge() : refusals.tooManyParts());
          reject(error instanceof Error && /multipart|boundary/i.test(error.message) ? refusals.noFile() : error);
        });
      });
      return next.handle();
    }
  };
}
