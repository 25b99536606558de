import type { FieldValues, Path, UseFormSetError } from "react-hook-form";

/** Puts the route handler's field errors on the form's own fields, so they show where the mistake is. */
export function showServerErrors<T extends FieldValues>(setError: UseFormSetError<T>, fieldErrors: Record<string, string>): void {
  for (const [field, message] of Object.entries(fieldErrors)) setError(field as Path<T>, { type: "server", message });
}

/** An <input> value for react-hook-form: empty is "not given", anything else a number (NaN is refused by the schema). */
export const asNumber = (value: unknown) => (value === "" || value === null || value === undefined ? undefined : Number(String(value).replace(",", ".")));

/** The message of the error at a dotted path of react-hook-form's errors ("specs.stretchPoints.1.tensionKN"). */
export function errorAt(errors: unknown, path: string): string | undefined {
  let node: unknown = errors;
  for (const part of path.split(".")) node = (node as Record<string, unknown> | undefined)?.[part];
  const message = (node as { message?: unknown } | undefined)?.message;
  return typeof message === "string" ? message : undefined;
}
