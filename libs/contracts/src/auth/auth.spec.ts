import { describe, expect, it } from 'vitest';
import { acceptInviteRequestSchema, signInRequestSchema } from './auth.js';

describe('auth contracts', () => {
  it('normalises e-mail addresses before they reach the server', () => {
    expect(signInRequestSchema.parse({ email: '  Tomas.Wren@Brackwater.Example ', password: 'x' }).email).toBe('tomas.wren@brackwater.example');
  });

  it('refuses malformed e-mail and unknown fields', () => {
    expect(signInRequestSchema.safeParse({ email: 'not-an-address', password: 'x' }).success).toBe(false);
    expect(signInRequestSchema.safeParse({ email: 'a@b.example', password: 'x', admin: true }).success).toBe(false);
  });

  it('asks new passwords for length, not composition', () => {
    const base = { token: 'x'.repeat(32), name: 'Ines Varga' };
    expect(acceptInviteRequestSchema.safeParse({ ...base, password: 'short' }).success).toBe(false);
    expect(acceptInviteRequestSchema.safeParse({ ...base, password: 'correct horse battery' }).success).toBe(true);
  });
});
