import { z } from 'zod';

export const auditEventSchema = z.object({
  id: z.string(),
  at: z.string(),
  actorId: z.string().nullable(),
  actorEmail: z.string().nullable(),
  action: z.string(),
  subjectType: z.string(),
  subjectId: z.string().nullable(),
  detail: z.record(z.string(), z.unknown()),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

export const auditQuerySchema = z.strictObject({
  action: z.string().max(100).optional(),
  actorId: z.uuid({ message: 'Must be a valid id' }).optional(),
  from: z.iso.datetime({ message: 'Use an ISO 8601 date-time' }).optional(),
  to: z.iso.datetime({ message: 'Use an ISO 8601 date-time' }).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
  offset: z.coerce.number().int().min(0).default(0),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export const auditListSchema = z.object({ items: z.array(auditEventSchema), total: z.number().int() });
export type AuditList = z.infer<typeof auditListSchema>;
