import "server-only";

/** True when PostgreSQL refused a row for breaking a unique constraint (SQLSTATE 23505), optionally a named one. */
export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  const pgError = error as { code?: string; constraint?: string } | null;
  return pgError?.code === "23505" && (constraint === undefined || pgError.constraint === constraint);
}
