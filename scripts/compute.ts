// Prints evaluateRig's result for a rig file (or JSON on standard input); bad input goes to stderr, exit 1.
import { readFileSync } from "node:fs";
import { evaluateRig, RigInputError, SolveError } from "../physics";

function fail(error: unknown): never {
  const report =
    error instanceof RigInputError || error instanceof SolveError
      ? error.toJSON()
      : { error: "Error", message: error instanceof Error ? error.message : String(error) };
  process.stderr.write(`${JSON.stringify(report, null, 2)}\n`);
  process.exit(1);
}

const path = process.argv[2];
let text: string;
try {
  text = readFileSync(path ?? 0, "utf8");
} catch (error) {
  fail({ message: `cannot read ${path ?? "standard input"}: ${(error as Error).message}` });
}
let input: unknown;
try {
  input = JSON.parse(text);
} catch (error) {
  fail(new RigInputError("(the whole input)", `${text.slice(0, 40)}…`, `JSON text (${(error as Error).message})`));
}
try {
  process.stdout.write(`${JSON.stringify(evaluateRig(input), null, 2)}\n`);
} catch (error) {
  fail(error);
}
