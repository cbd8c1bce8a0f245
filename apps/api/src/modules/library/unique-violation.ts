/** Whether a query failed on a unique constraint (SQLSTATE 23505), through Drizzle's wrapper or not. */
export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  for (let current: unknown = error; current instanceof Error || (current && typeof current === 'object'); current = (current as { cause?: unknown }).cause) {
    const candidate = current as { code?: unknown; constraint?: unknown; cause?: unknown };
    if (candidate.code === '23505') return constraint === undefined || candidate.constraint === constraint;
    if (candidate.cause === undefined || candidate.cause === current) return false;
  }
  return false;
}
