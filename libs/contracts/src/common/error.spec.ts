import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { errorBodySchema, fieldMessages } from './error.js';

describe('fieldMessages', () => {
  const schema = z.strictObject({
    inputs: z.strictObject({ lowerLimit: z.number({ message: 'Lower limit must be a number' }).min(0, 'Lower limit must not be negative') }),
    unit: z.enum(['mm', 'in'], { message: 'Unit must be mm or in' }),
  });

  it('gives one message per dotted field path, the first issue winning', () => {
    const result = schema.safeParse({ inputs: { lowerLimit: -1 }, unit: 'cm' });
    expect(result.success).toBe(false);
    expect(fieldMessages(result.error!)).toEqual({ 'inputs.lowerLimit': 'Lower limit must not be negative', unit: 'Unit must be mm or in' });
  });

  it('files problems of the whole body under "_"', () => {
    const result = z.string({ message: 'Send text' }).safeParse(1);
    expect(fieldMessages(result.error!)).toEqual({ _: 'Send text' });
  });

  it('names unknown fields so a client can see what it sent too much', () => {
    const result = schema.safeParse({ inputs: { lowerLimit: 1 }, unit: 'mm', colour: 'red' });
    expect(Object.values(fieldMessages(result.error!)).join(' ')).toContain('colour');
  });

  it('accepts only the documented error codes', () => {
    expect(errorBodySchema.safeParse({ statusCode: 400, code: 'VALIDATION_FAILED', message: 'x', fields: { a: 'b' } }).success).toBe(true);
    expect(errorBodySchema.safeParse({ statusCode: 400, code: 'OOPS', message: 'x' }).success).toBe(false);
  });
});
