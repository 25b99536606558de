import { RigInputError } from "./rig-input-error";
import { RigInputSchema, type RigInput } from "./rig-schema";

function valueAt(input: unknown, path: readonly PropertyKey[]): unknown {
  let value = input;
  for (const key of path) {
    if (value === null || typeof value !== "object") return undefined;
    value = (value as Record<PropertyKey, unknown>)[key];
  }
  return value;
}

// What a field of a given type takes, in words: the schema library's own message for a value of the wrong type
// ("Invalid input: expected object, received null") is for programmers.
const ALLOWED_OF_TYPE: Record<string, string> = {
  object: "its fields, given together as one group",
  array: "a list of entries",
  string: "text",
  number: "a number",
  boolean: "yes or no",
};

/** Validates raw input against RigInputSchema; the first problem becomes a RigInputError naming the field. */
export function parseRigInput(input: unknown): RigInput {
  const parsed = RigInputSchema.safeParse(input);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  const field = issue.path.length > 0 ? issue.path.map(String).join(".") : "(the whole input)";
  const allowed =
    issue.code === "invalid_type" && issue.message.startsWith("Invalid input") ? (ALLOWED_OF_TYPE[issue.expected] ?? issue.message) : issue.message;
  throw new RigInputError(field, valueAt(input, issue.path), allowed);
}
