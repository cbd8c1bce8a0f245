import { newPasswordSchema } from '@limitbook/contracts';
import { z } from 'zod';

/** The new-password pair used by reset and invitation forms; the server sees only `password`. */
export const newPasswordPairSchema = z.object({ password: newPasswordSchema, confirm: z.string() });

export function matchingPasswords<T extends z.ZodType<{ password: string; confirm: string }>>(schema: T) {
  return schema.refine((values) => values.password === values.confirm, { path: ['confirm'], message: 'The two passwords differ' });
}
