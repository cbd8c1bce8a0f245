import { z } from 'zod';

export const roles = ['admin', 'author', 'reviewer', 'reader'] as const;
export const roleSchema = z.enum(roles, { message: `Role must be one of ${roles.join(', ')}` });
export type Role = z.infer<typeof roleSchema>;

export const roleLabels: Record<Role, string> = {
  admin: 'Admin',
  author: 'Author',
  reviewer: 'Reviewer',
  reader: 'Reader',
};
