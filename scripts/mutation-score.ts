// After `npm run test:mutation`: prints the mutation score of physics/, the counts and every survivor (file:line, mutator,
// replacement), and writes the committed summary and the README's figures from the report.
// With --check it writes nothing: it fails when the report, the summary and the README disagree.
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { format, resolveConfig } from "prettier";
import {
  blockIn,
  inconsistencies,
  meetsGoal,
  readmeBlock,
  readReport,
  readSummary,
  README_PATH,
  REPORT_PATH,
  SCORE_GOAL_PCT,
  summarise,
  SUMMARY_PATH,
  type MutationSummary,
} from "./mutation-summary";

function print(s: MutationSummary, { survivors }: { survivors: boolean }) {
  const valid = s.killed + s.timeout + s.survived + s.noCoverage;
  console.log(`Mutation score of physics/: ${s.scorePct.toFixed(2)} % (${s.killed + s.timeout} of ${valid} valid mutants killed or timed out)`);
  console.log(
    `${s.mutants} mutants: ${s.killed} killed, ${s.timeout} timeout, ${s.survived} survived, ${s.noCoverage} no coverage, ` +
      `${s.compileError} compile errors, ${s.runtimeError} runtime errors, ${s.ignored} ignored`,
  );
  console.log(`The goal, at least ${SCORE_GOAL_PCT} %, is ${meetsGoal(s) ? "met" : "not met"}.`);
  if (survivors && s.survivors.length > 0) console.log(`\nSurvivors (${s.survivors.length}):\n${s.survivors.map((m) => `  ${m}`).join("\n")}`);
}

/** Written as `npm run format` would leave it, so prettier --check passes on what this script writes. */
async function writeFormatted(path: string, text: string) {
  writeFileSync(path, await format(text, { ...(await resolveConfig(path)), filepath: path }));
}

function check(): string[] {
  const summary = readSummary();
  const problems = inconsistencies(summary).map((p) => `${SUMMARY_PATH}: ${p}`);
  if (existsSync(REPORT_PATH)) {
    const fromReport = JSON.stringify(summarise(readReport()));
    if (fromReport !== JSON.stringify(summary))
      problems.push(`${SUMMARY_PATH} differs from the last run's report, ${REPORT_PATH}: run npm run test:mutation:score`);
  } else {
    console.log(`No report at ${REPORT_PATH} (npm run test:mutation makes one): checking the README against ${SUMMARY_PATH} only.`);
  }
  if (blockIn(readFileSync(README_PATH, "utf8")) !== readmeBlock(summary)) {
    problems.push(`${README_PATH}'s mutation figures differ from ${SUMMARY_PATH}: run npm run test:mutation:score`);
  }
  return problems;
}

async function main() {
  if (process.argv.includes("--check")) {
    const problems = check();
    if (problems.length > 0) {
      console.error(problems.join("\n"));
      process.exit(1);
    }
    print(readSummary(), { survivors: false });
    console.log("\nThe README, the summary and the report agree.");
  } else {
    if (!existsSync(REPORT_PATH)) {
      console.error(`No report at ${REPORT_PATH}: run npm run test:mutation first.`);
      process.exit(1);
    }
    const summary = summarise(readReport());
    print(summary, { survivors: true });
    await writeFormatted(SUMMARY_PATH, JSON.stringify(summary, null, 2));
    const readme = readFileSync(README_PATH, "utf8");
    const block = blockIn(readme);
    if (block === null) {
      console.error(`\n${README_PATH} has no mutation-score block to update; add this under "Mutation testing":\n\n${readmeBlock(summary)}`);
      process.exit(1);
    }
    await writeFormatted(README_PATH, readme.replace(block, readmeBlock(summary)));
    console.log(`\nWrote ${SUMMARY_PATH} and the figures in ${README_PATH}.`);
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
