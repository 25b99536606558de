import { checkNumber } from "./check-number";
import { solveEquilibrium } from "./equilibrium";
import type { Line } from "./line-equations";
import { pretensionGuess } from "./shallow-cable";
import { checkLine, describeEquilibrium, type LineSolution } from "./solve-line";

/**
 * The unstretched length that gives a stated pretension at one anchor with nobody on the line,
 * solved together with the unloaded equilibrium (three unknowns H, VA, L; span, rise and tension).
 */
export function lengthForPretension(line: Line, pretension: number, anchor: "a" | "b", breakingStrength: number): LineSolution {
  checkLine(line);
  checkNumber("breakingStrength", breakingStrength, (v) => v > 0, "a breaking strength > 0 N");
  checkNumber("pretension", pretension, (v) => v > 0 && v < breakingStrength, `a tension > 0 N and below the line's breaking strength, ${breakingStrength} N`);
  const { variables, iterations } = solveEquilibrium(
    line,
    pretensionGuess(line, pretension),
    ["H", "VA", "length"],
    [{ kind: "span" }, { kind: "rise" }, { kind: "tension", anchor, tension: pretension }],
    "unstretched length for the pretension",
  );
  return describeEquilibrium(line, variables, iterations);
}
