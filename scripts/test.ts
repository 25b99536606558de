// `npm test`: starts the test stack (own database and ports), then runs every suite and prints
// one closing line that adds them all up.
import fs from "node:fs";
import path from "node:path";
import { startStack, projectDir, type RunningStack } from "./services/stack";
import { serveApp, type AppServer } from "./services/app-server";
import { ensureChromium, CHROMIUM_PATH } from "./services/chromium";
import { runLive } from "./services/process";
import { StackError } from "./services/fail";

interface Tally {
  suite: string;
  passed: number;
  failed: number;
  skipped: number;
}

const bin = (name: string) => path.join(projectDir, "node_modules", ".bin", name);
const tallies: Tally[] = [];
let stack: RunningStack | null = null;
let server: AppServer | null = null;

function readJson<T>(file: string): T | null {
  try {
    return JSON.parse(fs.readFileSync(file, "utf8")) as T;
  } catch {
    return null;
  }
}

/** A step that is one check: it passes when its command exits 0. */
async function check(suite: string, command: string, args: string[], env: NodeJS.ProcessEnv = process.env): Promise<boolean> {
  console.log(`\n── ${suite} ──`);
  const ok = (await runLive(command, args, { cwd: projectDir, env })) === 0;
  tallies.push({ suite, passed: ok ? 1 : 0, failed: ok ? 0 : 1, skipped: 0 });
  return ok;
}

async function vitest(project: "unit" | "integration" | "faults", env: NodeJS.ProcessEnv, reportDir: string): Promise<void> {
  console.log(`\n── ${project} (vitest) ──`);
  const report = path.join(reportDir, `vitest-${project}.json`);
  fs.rmSync(report, { force: true });
  const args = ["run", "--project", project, "--reporter=default", "--reporter=json", `--outputFile.json=${report}`];
  const code = await runLive(bin("vitest"), args, { cwd: projectDir, env });
  const result = readJson<{ numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number }>(report);
  if (!result) {
    tallies.push({ suite: project, passed: 0, failed: 1, skipped: 0 });
    return;
  }
  // A suite file that fails to load counts as a failure even when no test inside it ran.
  const failed = result.numFailedTests + (code !== 0 && result.numFailedTests === 0 ? 1 : 0);
  tallies.push({ suite: project, passed: result.numPassedTests, failed, skipped: result.numPendingTests + result.numTodoTests });
}

async function playwright(env: NodeJS.ProcessEnv, reportDir: string): Promise<void> {
  console.log("\n── end to end (playwright, Chromium) ──");
  const report = path.join(reportDir, "playwright.json");
  fs.rmSync(report, { force: true });
  const code = await runLive(bin("playwright"), ["test", "--reporter=list,json"], {
    cwd: projectDir,
    env: { ...env, PLAYWRIGHT_JSON_OUTPUT_NAME: report },
  });
  const result = readJson<{ stats: { expected: number; unexpected: number; flaky: number; skipped: number } }>(report);
  if (!result) {
    tallies.push({ suite: "playwright", passed: 0, failed: 1, skipped: 0 });
    return;
  }
  const { expected, unexpected, flaky, skipped } = result.stats;
  tallies.push({ suite: "playwright", passed: expected + flaky, failed: unexpected + (code !== 0 && unexpected === 0 ? 1 : 0), skipped });
}

function summarise(): number {
  const total = tallies.reduce((t, x) => ({ passed: t.passed + x.passed, failed: t.failed + x.failed, skipped: t.skipped + x.skipped }), {
    passed: 0,
    failed: 0,
    skipped: 0,
  });
  console.log("\n── summary ──");
  for (const t of tallies) console.log(`  ${t.suite.padEnd(15)} ${t.passed} passed, ${t.failed} failed${t.skipped ? `, ${t.skipped} skipped` : ""}`);
  console.log(`tests: ${total.passed} passed, ${total.failed} failed${total.skipped ? `, ${total.skipped} skipped` : ""}`);
  return total.failed > 0 || tallies.length === 0 ? 1 : 0;
}

async function main(): Promise<number> {
  await ensureChromium();
  stack = await startStack("test");
  const reportDir = stack.settings.dataDir;
  // Each runner sets NODE_ENV itself (Vitest "test", the build "production").
  const testEnv = Object.fromEntries(
    Object.entries({ ...process.env, ...stack.env, NEXT_DIST_DIR: ".next-test" }).filter(([name]) => name !== "NODE_ENV"),
  ) as NodeJS.ProcessEnv;
  await check("lint", bin("eslint"), ["."]);
  await check("format", bin("prettier"), ["--check", "."]);
  await check("typecheck", bin("tsc"), ["--noEmit"]);
  // Stryker's run is too slow for every test run; its committed score is held to the report and to the README here.
  await check("mutation score", bin("tsx"), ["scripts/mutation-score.ts", "--check"]);
  await vitest("unit", testEnv, reportDir);
  const built = await check("build", bin("next"), ["build"], { ...testEnv, NODE_ENV: "production" });
  if (built) {
    // Integration suites talk to the real server over HTTP as well as to the real database.
    server = await serveApp({ ...stack.env, NEXT_DIST_DIR: ".next-test" }, stack.settings.appPort);
    await vitest("integration", { ...testEnv, APP_URL: server.url }, reportDir);
    await playwright({ ...testEnv, E2E_BASE_URL: server.url, CHROMIUM_PATH }, reportDir);
    // Last, as it stops the database in the middle of a load run.
    await vitest("faults", { ...testEnv, APP_URL: server.url }, reportDir);
  } else {
    for (const suite of ["integration", "playwright", "faults"]) tallies.push({ suite, passed: 0, failed: 1, skipped: 0 });
  }
  return summarise();
}

async function shutdown() {
  try {
    await server?.stop();
  } finally {
    await stack?.stop();
  }
}

process.on("SIGINT", () => void shutdown().then(() => process.exit(130)));

main()
  .then(async (code) => {
    await shutdown();
    process.exit(code);
  })
  .catch(async (error) => {
    console.error(`spanwright: ${error instanceof StackError ? error.message : (error as Error).stack}`);
    await shutdown();
    tallies.push({ suite: "setup", passed: 0, failed: 1, skipped: 0 });
    summarise();
    process.exit(1);
  });
