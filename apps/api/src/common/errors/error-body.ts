import { HttpException, HttpStatus, Logger } from '@nestjs/common';
import { type ErrorBody, type ErrorCode } from '@limitbook/contracts';
import { AppException } from './app.exception.js';

const logger = new Logger('Errors');

const codeByStatus: Partial<Record<number, ErrorCode>> = {
  [HttpStatus.BAD_REQUEST]: 'VALIDATION_FAILED',
  [HttpStatus.UNAUTHORIZED]: 'UNAUTHENTICATED',
  [HttpStatus.FORBIDDEN]: 'FORBIDDEN',
  [HttpStatus.NOT_FOUND]: 'NOT_FOUND',
  [HttpStatus.METHOD_NOT_ALLOWED]: 'NOT_FOUND',
  [HttpStatus.CONFLICT]: 'CONFLICT',
  [HttpStatus.PAYLOAD_TOO_LARGE]: 'PAYLOAD_TOO_LARGE',
  [HttpStatus.UNSUPPORTED_MEDIA_TYPE]: 'UNSUPPORTED_MEDIA_TYPE',
  [HttpStatus.TOO_MANY_REQUESTS]: 'RATE_LIMITED',
};

const defaultMessages: Partial<Record<ErrorCode, string>> = {
  UNAUTHENTICATED: 'Sign in to continue.',
  FORBIDDEN: 'Your role does not allow this.',
  RATE_LIMITED: 'Too many attempts. Wait a minute, then try again.',
  PAYLOAD_TOO_LARGE: 'The request body is too large.',
  UNSUPPORTED_MEDIA_TYPE: 'Send the request body as JSON.',
};

/** Errors raised by Express's body parser before Nest sees the request. */
interface BodyParserError {
  type?: string;
  status?: number;
  expose?: boolean;
}

function isBodyParserError(error: unknown): error is BodyParserError & Error {
  return error instanceof Error && typeof (error as BodyParserError).type === 'string' && typeof (error as BodyParserError).status === 'number';
}

/** Maps anything thrown while serving a request to the one error shape. Unknown errors are logged and never leak. */
export function toErrorBody(error: unknown): ErrorBody {
  if (error instanceof AppException) return error.body;

  if (isBodyParserError(error)) {
    if (error.type === 'entity.parse.failed') {
      return { statusCode: 400, code: 'MALFORMED_JSON', message: 'The request body is not valid JSON.', fields: { _: 'Not valid JSON' } };
    }
    if (error.type === 'entity.too.large') {
      return { statusCode: 413, code: 'PAYLOAD_TOO_LARGE', message: defaultMessages.PAYLOAD_TOO_LARGE! };
    }
    if (error.type === 'encoding.unsupported' || error.type === 'charset.unsupported') {
      return { statusCode: 415, code: 'UNSUPPORTED_MEDIA_TYPE', message: 'Send the request body as UTF-8 JSON.' };
    }
    if (error.status && error.status < 500) {
      return { statusCode: 400, code: 'VALIDATION_FAILED', message: 'The request body could not be read.' };
    }
  }

  if (error instanceof HttpException) {
    const statusCode = error.getStatus();
    if (statusCode < 500) {
      const code = codeByStatus[statusCode] ?? 'VALIDATION_FAILED';
      const response = error.getResponse();
      const raw = typeof response === 'string' ? response : (response as { message?: unknown }).message;
      const message = defaultMessages[code] ?? (typeof raw === 'string' ? raw : error.message);
      return { statusCode, code, message };
    }
  }

  logger.error(error instanceof Error ? (error.stack ?? error.message) : `Non-error thrown: ${String(error)}`);
  return { statusCode: 500, code: 'INTERNAL', message: 'Something went wrong on the server. The error has been logged.' };
}
