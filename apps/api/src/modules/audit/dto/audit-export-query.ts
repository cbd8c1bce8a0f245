import { auditQuerySchema } from '@limitbook/contracts';
import { type z } from 'zod';

/** The list filters without paging: an export holds every matching event. */
export const auditExportQuerySchema = auditQuerySchema.omit({ limit: true, offset: true });
export type AuditExportQuery = z.infer<typeof auditExportQuerySchema>;
