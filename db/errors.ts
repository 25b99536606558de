import "server-only";

/** True when PostgreSQL refused a row for breaking a unique constraint (SQLSTATE 23505), optionally a named one. */
export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  const pgError = error as { code?: string; constraint?: string } | null;
  return pgError?.code === "23505" && (constraint === undefined || pgError.constraint === constraint);
}

// Errors that mean "the database is not there just now", not "this request is wrong": the connection was refused,
// cut or timed out, the server is shutting down or starting (SQLSTATE class 08 and 57P01–57P03), or no pooled
// connection could be had in time.
const UNREACHABLE_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EPIPE", "EHOSTUNREACH", "57P01", "57P02", "57P03"]);
const UNREACHABLE_MESSAGES = /Connection terminated|connection error and is not queryable|Timeout acquiring a connection|Connection ended unexpectedly/;

/** True when the error, or one it wraps, says the database could not be reached rather than that it refused the work. */
export function isDatabaseUnreachable(error: unknown, depth = 0): boolean {
  if (!error || typeof error !== "object" || depth > 5) return false;
  const { code, message, cause, errors, name } = error as { code?: unknown; message?: unknown; cause?: unknown; errors?: unknown; name?: unknown };
  if (typeof code === "string" && (UNREACHABLE_CODES.has(code) || code.startsWith("08"))) return true;
  if (name === "KnexTimeoutError" || (typeof message === "string" && UNREACHABLE_MESSAGES.test(message))) return true;
  return isDatabaseUnreachable(cause, depth + 1) || (Array.isArray(errors) && errors.some((inner) => isDatabaseUnreachable(inner, depth + 1)));
}
