import { ZodError } from "zod";

/** A request the server understood but will not carry out: its status and what to tell the caller. */
export class RequestError extends Error {
  constructor(
    readonly status: 400 | 404 | 409 | 410 | 413 | 415 | 422 | 429 | 503,
    message: string,
    readonly fieldErrors: Record<string, string> = {},
    readonly headers: Record<string, string> = {},
  ) {
    super(message);
    this.name = "RequestError";
  }
}

/** Zod's issues as one message per field path (the key the form puts the message beside), in the words of the schema. */
export function fieldErrorsOf(error: ZodError): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "form";
    // A body that is not an object at all comes from a program, not from a form: say what the route takes.
    const message = issue.path.length === 0 && issue.code === "invalid_type" ? "Send the form's fields as a JSON object." : issue.message;
    errors[key] ??= message;
  }
  return errors;
}

/** A 400 whose message is the schema's own messages, each naming its field as the form labels it: never a field path. */
export function invalidInput(error: ZodError): RequestError {
  const fields = fieldErrorsOf(error);
  return new RequestError(400, `Nothing was saved. ${[...new Set(Object.values(fields))].join(" ")}`, fields);
}
