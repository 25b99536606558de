// The mutation score of physics/: read from Stryker's JSON report (the mutation-testing-report-schema), kept as a small
// committed summary (physics/mutation-score.json) and stated in the README between two markers, so the figures cannot drift.
import { readFileSync } from "node:fs";

export const REPORT_PATH = ".data/mutation/mutation.json";
export const SUMMARY_PATH = "physics/mutation-score.json";
export const README_PATH = "README.md";

const STATUSES = ["Killed", "Timeout", "Survived", "NoCoverage", "CompileError", "RuntimeError", "Ignored"] as const;
type Status = (typeof STATUSES)[number];

interface ReportMutant {
  mutatorName: string;
  replacement?: string;
  status: Status;
  location: { start: { line: number; column: number } };
}

export interface MutationReport {
  files: Record<string, { mutants: ReportMutant[] }>;
}

export interface MutationSummary {
  /** Killed + timed out over the valid mutants (killed + timed out + survived + not covered), %, cut to two decimals. */
  scorePct: number;
  mutants: number;
  killed: number;
  timeout: number;
  survived: number;
  noCoverage: number;
  compileError: number;
  runtimeError: number;
  ignored: number;
  /** Each surviving or uncovered mutant: "file:line:column Mutator → replacement". */
  survivors: string[];
}

export function readReport(path = REPORT_PATH): MutationReport {
  const report = JSON.parse(readFileSync(path, "utf8")) as MutationReport;
  if (!report || typeof report.files !== "object") throw new Error(`${path} is not a mutation-testing report (no "files")`);
  return report;
}

const cut = (value: number, decimals: number) => Math.floor(value * 10 ** decimals) / 10 ** decimals;

export function summarise(report: MutationReport): MutationSummary {
  const counts = Object.fromEntries(STATUSES.map((s) => [s, 0])) as Record<Status, number>;
  const survivors: string[] = [];
  for (const [file, { mutants }] of Object.entries(report.files).sort(([a], [b]) => a.localeCompare(b))) {
    for (const m of [...mutants].sort((a, b) => a.location.start.line - b.location.start.line || a.location.start.column - b.location.start.column)) {
      if (!STATUSES.includes(m.status)) throw new Error(`${file}: unknown mutant status ${m.status}`);
      counts[m.status]++;
      if (m.status === "Survived" || m.status === "NoCoverage") {
        const { line, column } = m.location.start;
        const what = m.replacement === undefined ? m.mutatorName : `${m.mutatorName} → ${m.replacement.replace(/\s+/g, " ")}`;
        survivors.push(`${file}:${line}:${column} ${m.status === "NoCoverage" ? "(not covered) " : ""}${what}`);
      }
    }
  }
  const detected = counts.Killed + counts.Timeout;
  const valid = detected + counts.Survived + counts.NoCoverage;
  return {
    scorePct: valid === 0 ? 0 : cut((100 * detected) / valid, 2),
    mutants: STATUSES.reduce((sum, s) => sum + counts[s], 0),
    killed: counts.Killed,
    timeout: counts.Timeout,
    survived: counts.Survived,
    noCoverage: counts.NoCoverage,
    compileError: counts.CompileError,
    runtimeError: counts.RuntimeError,
    ignored: counts.Ignored,
    survivors,
  };
}

export function readSummary(path = SUMMARY_PATH): MutationSummary {
  return JSON.parse(readFileSync(path, "utf8")) as MutationSummary;
}

/** The mutation score of physics/ the engine's tests are held to, %. */
export const SCORE_GOAL_PCT = 90;

export const meetsGoal = (s: MutationSummary) => s.scorePct >= SCORE_GOAL_PCT;

export const BLOCK_START = "<!-- mutation-score: written by npm run test:mutation:score, checked by npm run test:mutation:check -->";
export const BLOCK_END = "<!-- /mutation-score -->";

/** The README's figures, rendered from the summary (the score cut to one decimal, never rounded up). */
export function readmeBlock(s: MutationSummary): string {
  const valid = s.killed + s.timeout + s.survived + s.noCoverage;
  return [
    BLOCK_START,
    "",
    `- Score: **${cut(s.scorePct, 1).toFixed(1)} %** (killed or timed out, over the ${valid} valid mutants)`,
    `- Mutants: ${s.mutants} in all: ${s.killed} killed, ${s.timeout} timed out, ${s.survived} survived, ${s.noCoverage} not covered;` +
      ` ${s.compileError} refused by the TypeScript checker, ${s.runtimeError} runtime errors, ${s.ignored} ignored`,
    `- Goal: at least ${SCORE_GOAL_PCT} %: ${meetsGoal(s) ? "met" : `**not met** (${s.survivors.length} survivors to kill or show harmless)`}`,
    "",
    BLOCK_END,
  ].join("\n");
}

/** The block as the README has it, or null when the markers are missing. */
export function blockIn(readme: string): string | null {
  const start = readme.indexOf(BLOCK_START);
  const end = readme.indexOf(BLOCK_END, start);
  return start < 0 || end < 0 ? null : readme.slice(start, end + BLOCK_END.length);
}

/** Disagreements between the summary's own figures (the score and the survivor list follow from the counts). A score below
 * the goal is no disagreement: the README says so beside it, and a run that lowers the score is committed as it is. */
export function inconsistencies(s: MutationSummary): string[] {
  const problems: string[] = [];
  const valid = s.killed + s.timeout + s.survived + s.noCoverage;
  const score = valid === 0 ? 0 : cut((100 * (s.killed + s.timeout)) / valid, 2);
  if (score !== s.scorePct) problems.push(`scorePct ${s.scorePct} is not (killed + timeout) / valid = ${score}`);
  const total = valid + s.compileError + s.runtimeError + s.ignored;
  if (total !== s.mutants) problems.push(`mutants ${s.mutants} is not the sum of the statuses, ${total}`);
  if (s.survivors.length !== s.survived + s.noCoverage) problems.push(`${s.survivors.length} survivors listed, ${s.survived + s.noCoverage} counted`);
  return problems;
}
