import { ZodError } from "zod";

/** A request the server understood but will not carry out: its status and what to tell the caller. */
export class RequestError extends Error {
  constructor(
    readonly status: 400 | 404 | 409 | 410 | 413 | 415 | 422 | 429,
    message: string,
    readonly fieldErrors: Record<string, string> = {},
    readonly headers: Record<string, string> = {},
  ) {
    super(message);
    this.name = "RequestError";
  }
}

/** Zod's issues as one message per field path, in the words of the schema. */
export function fieldErrorsOf(error: ZodError): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "form";
    errors[key] ??= issue.message;
  }
  return errors;
}

export function invalidInput(error: ZodError): RequestError {
  const fields = fieldErrorsOf(error);
  const summary = Object.entries(fields)
    .map(([field, message]) => `${field}: ${message}`)
    .join("; ");
  return new RequestError(400, `The input is not valid (${summary}).`, fields);
}
