/** An input the engine cannot work with: names the field, what was given and what is allowed. */
export class RigInputError extends Error {
  readonly field: string;
  readonly given: string;
  readonly allowed: string;

  constructor(field: string, given: unknown, allowed: string) {
    const shown = describeValue(given);
    super(`${field}: got ${shown}; allowed: ${allowed}`);
    this.name = "RigInputError";
    this.field = field;
    this.given = shown;
    this.allowed = allowed;
  }

  toJSON() {
    return { error: this.name, field: this.field, given: this.given, allowed: this.allowed, message: this.message };
  }
}

// JSON.stringify turns NaN and Infinity into null, which would hide the very mistake being reported.
function describeValue(value: unknown): string {
  if (typeof value === "number") return String(value);
  if (value === undefined) return "nothing";
  try {
    return JSON.stringify(value) ?? String(value);
  } catch {
    return String(value);
  }
}
