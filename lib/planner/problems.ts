import { RigInputError } from "@/physics";
import { messageInUnits, type UnitSystem } from "@/lib/rig-form/quantities";
import { RequestError } from "@/lib/http-errors";
import { kindOf, labelOf } from "./fields";
import type { GearProblem } from "./kit";

/** The sentence beside a field when what is wrong is best said by what is allowed there. */
export function allowedSentence(allowed: string): string {
  return `Allowed: ${allowed.replace(/\.$/, "")}.`;
}

/** What the engine refused, in the form's words and the crew's units: the field, what is allowed there, and one sentence. */
export function rigInputProblem(error: RigInputError, units: UnitSystem): { field: string; allowed: string; sentence: string } {
  const kind = kindOf(error.field);
  const allowed = messageInUnits(
    error.allowed,
    kind === "pick" || kind === "text" || kind === "choice" || kind === "list" || kind === "flag" ? "plain" : kind,
    units,
  );
  return { field: error.field, allowed, sentence: `${labelOf(error.field, units)}: allowed is ${allowed}.` };
}

/** A 400 for an input the engine refused, naming the field as the form labels it. */
export function rigInputRefusal(error: RigInputError, units: UnitSystem): RequestError {
  const problem = rigInputProblem(error, units);
  return new RequestError(400, `This rig cannot be saved. ${problem.sentence}`, { [problem.field]: allowedSentence(problem.allowed) });
}

/** A 400 for gear picks the Kit cannot honour, each on its field. */
export function gearRefusal(problems: readonly GearProblem[]): RequestError {
  const fieldErrors = Object.fromEntries(problems.map((p) => [p.field, p.message]));
  return new RequestError(400, `This rig cannot be saved. ${problems.map((p) => p.message).join(" ")}`, fieldErrors);
}
