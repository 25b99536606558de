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

/** Validates raw input against RigInputSchema; the first problem becomes a RigInputError naming the field. */
export function parseRigInput(input: unknown): RigInput {
  const parsed = RigInputSchema.safeParse(input);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  const field = issue.path.length > 0 ? issue.path.map(String).join(".") : "(the whole input)";
  throw new RigInputError(field, valueAt(input, issue.path), issue.message);
}
