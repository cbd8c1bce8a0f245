import { Logger, NotFoundException } from '@nestjs/common';
import { ThrottlerException } from '@nestjs/throttler';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { AppException } from './app.exception.js';
import { toErrorBody } from './error-body.js';

describe('toErrorBody', () => {
  afterEach(() => vi.restoreAllMocks());

  it('turns an unexpected error into a logged 500 that reveals nothing', () => {
    const logged = vi.spyOn(Logger.prototype, 'error').mockImplementation(() => undefined);
    const body = toErrorBody(new Error('connect ECONNREFUSED 10.0.0.5:5432 password=hunter2'));
    expect(body).toEqual({ statusCode: 500, code: 'INTERNAL', message: expect.any(String) });
    expect(JSON.stringify(body)).not.toMatch(/ECONNREFUSED|hunter2|5432/);
    expect(logged).toHaveBeenCalledWith(expect.stringContaining('ECONNREFUSED'));
  });

  it('keeps the shape of our own errors and maps framework ones to a code', () => {
    expect(toErrorBody(new AppException(409, 'CONFLICT', 'Taken', { email: 'Already in use' }))).toEqual({ statusCode: 409, code: 'CONFLICT', message: 'Taken', fields: { email: 'Already in use' } });
    expect(toErrorBody(new NotFoundException('Cannot GET /api/x'))).toEqual({ statusCode: 404, code: 'NOT_FOUND', message: 'Cannot GET /api/x' });
    expect(toErrorBody(new ThrottlerException())).toMatchObject({ statusCode: 429, code: 'RATE_LIMITED' });
  });
});
