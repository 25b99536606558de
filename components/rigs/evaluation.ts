import { evaluateRig, RigInputError, SolveError, type RigResult } from "@/physics";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { prepareRigInput, type GearProblem, type KitCatalogue, type SiteSnapshot } from "@/lib/planner/kit";
import { allowedSentence, rigInputProblem } from "@/lib/planner/problems";

/** What the browser's engine made of the planner's values: figures (with the exact input evaluated), or the reason there are none. */
export type Evaluation =
  | { kind: "figures"; input: Record<string, unknown>; result: RigResult; gearProblems: GearProblem[] }
  | { kind: "input"; input: Record<string, unknown>; field: string; sentence: string; allowed: string; gearProblems: GearProblem[] }
  | { kind: "solve"; input: Record<string, unknown>; message: string; gearProblems: GearProblem[] };

/** Prepares the values with the Kit and the site as the server will, then evaluates them. */
export function evaluatePlanner(values: unknown, catalogue: KitCatalogue, site: SiteSnapshot | null, units: UnitSystem): Evaluation {
  const { input, problems } = prepareRigInput(values, catalogue, site);
  try {
    return { kind: "figures", input, result: evaluateRig(input, { units }), gearProblems: problems };
  } catch (error) {
    if (error instanceof RigInputError) {
      const problem = rigInputProblem(error, units);
      return { kind: "input", input, field: problem.field, sentence: problem.sentence, allowed: problem.allowed, gearProblems: problems };
    }
    if (error instanceof SolveError) return { kind: "solve", input, message: error.message, gearProblems: problems };
    throw error;
  }
}

/** Every problem of an evaluation as the sentence to show beside its field. */
export function fieldProblemsOf(evaluation: Evaluation): Record<string, string> {
  const problems: Record<string, string> = Object.fromEntries(evaluation.gearProblems.map((p) => [p.field, p.message]));
  if (evaluation.kind === "input") problems[evaluation.field] ??= allowedSentence(evaluation.allowed);
  return problems;
}
