import { HttpException } from '@nestjs/common';
import { type ErrorBody, type ErrorCode } from '@limitbook/contracts';

/** An error whose body is already in the API's one shape; module exceptions build on it. */
export class AppException extends HttpException {
  constructor(
    status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
    /** Response headers that belong with the error, e.g. WWW-Authenticate on a 401. */
    readonly headers?: Record<string, string>,
  ) {
    const body: ErrorBody = { statusCode: status, code, message, ...(fields ? { fields } : {}) };
    super(body, status);
  }

  get body(): ErrorBody {
    return this.getResponse() as ErrorBody;
  }
}
