import { type ArgumentsHost, Catch, type ExceptionFilter } from '@nestjs/common';
import { type Response } from 'express';
import { AppException } from './app.exception.js';
import { toErrorBody } from './error-body.js';

@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = toErrorBody(exception);
    if (response.headersSent) {
      response.end();
      return;
    }
    // A handler may have set headers for its success response (a CSV download); the error is JSON.
    response.removeHeader('Content-Disposition');
    response.setHeader('Content-Type', 'application/json; charset=utf-8');
    if (exception instanceof AppException && exception.headers) response.set(exception.headers);
    response.status(body.statusCode).json(body);
  }
}
