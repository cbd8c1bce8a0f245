import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { applyServerErrors } from './server-errors';

const validation = (fields: Record<string, string>) =>
  new ApiError({ statusCode: 400, code: 'VALIDATION_FAILED', message: 'This invitation link is invalid, already used or expired.', fields });

describe('applyServerErrors', () => {
  it('puts messages on the form’s own fields and leaves nothing above the form', () => {
    const form = { setErrors: vi.fn() };
    expect(applyServerErrors(form, validation({ password: 'Use at least 12 characters' }), ['name', 'password'])).toBeNull();
    expect(form.setErrors).toHaveBeenCalledWith({ password: 'Use at least 12 characters' });
  });

  it('keeps the main message and adds what concerns fields the form does not show', () => {
    const form = { setErrors: vi.fn() };
    expect(applyServerErrors(form, validation({ token: 'Ask an admin to send a new invitation' }), ['name', 'password'])).toBe(
      'This invitation link is invalid, already used or expired. Ask an admin to send a new invitation.',
    );
  });

  it('falls back to a plain message for errors that did not come from the API', () => {
    expect(applyServerErrors({ setErrors: vi.fn() }, new TypeError('boom'), [])).toBe('Something went wrong. Try again.');
  });
});
