import { describe, expect, it } from "vitest";
import { calculateMetrics } from "mutation-testing-metrics";
import {
  BLOCK_END,
  BLOCK_START,
  blockIn,
  inconsistencies,
  meetsGoal,
  readmeBlock,
  SCORE_GOAL_PCT,
  summarise,
  type MutationReport,
} from "@/scripts/mutation-summary";

type FileResultDictionary = Parameters<typeof calculateMetrics>[0];
// Stryker reports every mutant it ran: none is left pending.
type MutantStatus = Exclude<FileResultDictionary[string]["mutants"][number]["status"], "Pending">;

// A report in the mutation-testing-report-schema's shape, with every status Stryker gives and mutants out of order.
type Mutant = FileResultDictionary[string]["mutants"][number] & { status: MutantStatus };
function report(statuses: Record<string, MutantStatus[]>): MutationReport & { files: Record<string, FileResultDictionary[string] & { mutants: Mutant[] }> } {
  const files: Record<string, FileResultDictionary[string] & { mutants: Mutant[] }> = {};
  for (const [file, list] of Object.entries(statuses)) {
    files[file] = {
      language: "typescript",
      source: "",
      mutants: list.map((status, i) => ({
        id: `${file}-${i}`,
        mutatorName: i % 2 ? "ArithmeticOperator" : "ConditionalExpression",
        replacement: i % 2 ? "a  -\n b" : undefined,
        status,
        location: { start: { line: 10 - i, column: 1 + i }, end: { line: 10 - i, column: 5 + i } },
      })),
    };
  }
  return { files };
}

const mixed = () =>
  report({
    "physics/b.ts": ["Killed", "Survived", "Timeout", "Ignored", "CompileError"],
    "physics/a.ts": ["Killed", "Killed", "NoCoverage", "RuntimeError", "Killed", "Survived"],
  });

describe("the mutation summary", () => {
  it("counts and scores a report as the reference library of the report's schema does (mutation-testing-metrics 3.7.3)", () => {
    const input = mixed();
    const summary = summarise(input);
    const { metrics } = calculateMetrics(input.files);
    expect(summary.mutants).toBe(metrics.totalMutants);
    expect(summary.killed).toBe(metrics.killed);
    expect(summary.timeout).toBe(metrics.timeout);
    expect(summary.survived).toBe(metrics.survived);
    expect(summary.noCoverage).toBe(metrics.noCoverage);
    expect(summary.compileError).toBe(metrics.compileErrors);
    expect(summary.runtimeError).toBe(metrics.runtimeErrors);
    expect(summary.ignored).toBe(metrics.ignored);
    // Cut, never rounded up: 5 detected of 8 valid is 62.5 %; the library keeps every decimal.
    expect(summary.scorePct).toBe(Math.floor(metrics.mutationScore * 100) / 100);
    // Below the goal is no disagreement: the README says so.
    expect(inconsistencies(summary)).toEqual([]);
    expect(meetsGoal(summary)).toBe(false);
  });

  it("lists each survivor by file, line and column, files in order and lines in order", () => {
    expect(summarise(mixed()).survivors).toEqual([
      "physics/a.ts:5:6 ArithmeticOperator → a - b",
      "physics/a.ts:8:3 (not covered) ConditionalExpression",
      "physics/b.ts:9:2 ArithmeticOperator → a - b",
    ]);
  });

  it("holds a summary at the goal to it, and finds each figure that does not add up", () => {
    const passing = summarise(report({ "physics/a.ts": [...Array<MutantStatus>(9).fill("Killed"), "Survived"] }));
    expect(passing.scorePct).toBe(90);
    expect(meetsGoal(passing)).toBe(true);
    expect(inconsistencies(passing)).toEqual([]);
    expect(inconsistencies({ ...passing, scorePct: 95 })).toEqual(["scorePct 95 is not (killed + timeout) / valid = 90"]);
    expect(inconsistencies({ ...passing, mutants: 11 })).toEqual(["mutants 11 is not the sum of the statuses, 10"]);
    expect(inconsistencies({ ...passing, survivors: [] })).toEqual(["0 survivors listed, 1 counted"]);
  });

  it("writes the README's block between its markers and finds it again", () => {
    const block = readmeBlock(summarise(mixed()));
    expect(block.startsWith(BLOCK_START) && block.endsWith(BLOCK_END)).toBe(true);
    expect(block).toContain("- Score: **62.5 %** (killed or timed out, over the 8 valid mutants)");
    expect(block).toContain(`- Goal: at least ${SCORE_GOAL_PCT} %: **not met** (3 survivors to kill or show harmless)`);
    expect(blockIn(`# Title\n\n${block}\n\nmore`)).toBe(block);
    expect(blockIn("# Title, no block")).toBeNull();
  });
});
