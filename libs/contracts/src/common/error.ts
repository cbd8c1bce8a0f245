import { z } from 'zod';

/** Every error the API returns has this one shape. */
export const errorCodes = [
  'VALIDATION_FAILED',
  'MALFORMED_JSON',
  'PAYLOAD_TOO_LARGE',
  'UNAUTHENTICATED',
  'FORBIDDEN',
  'NOT_FOUND',
  'CONFLICT',
  'RATE_LIMITED',
  'UNSUPPORTED_MEDIA_TYPE',
  'INTERNAL',
] as const;
export const errorCodeSchema = z.enum(errorCodes);
export type ErrorCode = z.infer<typeof errorCodeSchema>;

export const errorBodySchema = z.object({
  statusCode: z.number().int(),
  code: errorCodeSchema,
  message: z.string(),
  /** One message per offending field, keyed by its dotted path (`inputs.lowerLimit`, `items.2.unit`). */
  fields: z.record(z.string(), z.string()).optional(),
});
export type ErrorBody = z.infer<typeof errorBodySchema>;

/** Flattens a zod error into one message per field path (the first issue of each path wins). */
export function fieldMessages(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.map(String).join('.') : '_';
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}
