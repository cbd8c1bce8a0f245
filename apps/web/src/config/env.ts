import { z } from 'zod';

const envSchema = z.object({
  /** Origin of the API; empty means the same origin that served the app (the production set-up). */
  API_URL: z
    .string()
    .default('')
    .transform((value) => value.replace(/\/+$/, '')),
});

function readEnv() {
  const raw: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(import.meta.env)) {
    if (key.startsWith('VITE_APP_')) raw[key.slice('VITE_APP_'.length)] = value;
  }
  const parsed = envSchema.safeParse(raw);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `- VITE_APP_${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid web app environment:\n${lines.join('\n')}`);
  }
  return parsed.data;
}

export const env = readEnv();
