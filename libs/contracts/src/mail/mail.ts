import { z } from 'zod';

export const capturedMailSummarySchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  receivedAt: z.string(),
});
export type CapturedMailSummary = z.infer<typeof capturedMailSummarySchema>;

export const capturedMailSchema = capturedMailSummarySchema.extend({
  text: z.string(),
  /** HTML part as received; the web app shows it only inside a sandboxed frame. */
  html: z.string().nullable(),
});
export type CapturedMail = z.infer<typeof capturedMailSchema>;

export const capturedMailListSchema = z.object({ items: z.array(capturedMailSummarySchema), total: z.number().int() });
export type CapturedMailList = z.infer<typeof capturedMailListSchema>;
