import { z } from 'zod';
import { roleSchema } from './roles.js';

export const emailSchema = z
  .string({ message: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter a valid e-mail address' }).max(254, 'E-mail is too long'));

/** Passphrases are checked for length only; long passphrases beat composition rules. */
export const newPasswordSchema = z
  .string({ message: 'Password is required' })
  .min(12, 'Use at least 12 characters')
  .max(200, 'Use at most 200 characters');

export const sessionUserSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

export const signInRequestSchema = z.strictObject({
  email: emailSchema,
  password: z.string({ message: 'Password is required' }).min(1, 'Password is required').max(200, 'Password is too long'),
});
export type SignInRequest = z.infer<typeof signInRequestSchema>;

export const signInResponseSchema = z.object({
  accessToken: z.string(),
  /** Seconds until the access token expires. */
  expiresIn: z.number().int(),
  user: sessionUserSchema,
});
export type SignInResponse = z.infer<typeof signInResponseSchema>;

export const forgotPasswordRequestSchema = z.strictObject({ email: emailSchema });
export type ForgotPasswordRequest = z.infer<typeof forgotPasswordRequestSchema>;

export const resetPasswordRequestSchema = z.strictObject({
  token: z.string({ message: 'Reset link is missing its token' }).min(20, 'Reset link is invalid').max(200),
  password: newPasswordSchema,
});
export type ResetPasswordRequest = z.infer<typeof resetPasswordRequestSchema>;

export const acceptInviteRequestSchema = z.strictObject({
  token: z.string({ message: 'Invitation link is missing its token' }).min(20, 'Invitation link is invalid').max(200),
  name: z.string({ message: 'Name is required' }).trim().min(1, 'Name is required').max(120, 'Name is too long'),
  password: newPasswordSchema,
});
export type AcceptInviteRequest = z.infer<typeof acceptInviteRequestSchema>;
