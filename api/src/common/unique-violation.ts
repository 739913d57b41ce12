/** PostgreSQL's unique_violation (SQLSTATE 23505), optionally of one named index or constraint. */
export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  const e = error as { code?: unknown; constraint?: unknown } | null;
  return e?.code === '23505' && (constraint === undefined || e.constraint === constraint);
}
