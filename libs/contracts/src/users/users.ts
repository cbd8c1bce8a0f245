import { z } from 'zod';
import { emailSchema } from '../auth/auth.js';
import { roleSchema } from '../auth/roles.js';

export const userStatusSchema = z.enum(['invited', 'active', 'deactivated']);
export type UserStatus = z.infer<typeof userStatusSchema>;

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  status: userStatusSchema,
  createdAt: z.string(),
  lastSignInAt: z.string().nullable(),
});
export type User = z.infer<typeof userSchema>;

export const userListSchema = z.object({ items: z.array(userSchema), total: z.number().int() });
export type UserList = z.infer<typeof userListSchema>;

export const inviteUserRequestSchema = z.strictObject({
  email: emailSchema,
  name: z.string({ message: 'Name is required' }).trim().min(1, 'Name is required').max(120, 'Name is too long'),
  role: roleSchema,
});
export type InviteUserRequest = z.infer<typeof inviteUserRequestSchema>;

export const updateUserRequestSchema = z
  .strictObject({
    role: roleSchema.optional(),
    active: z.boolean({ message: 'Active must be true or false' }).optional(),
    name: z.string().trim().min(1, 'Name is required').max(120, 'Name is too long').optional(),
  })
  .refine((body) => Object.keys(body).length > 0, { message: 'Nothing to change' });
export type UpdateUserRequest = z.infer<typeof updateUserRequestSchema>;
