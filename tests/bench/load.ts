// `npm run bench:load`: load on the production build (`npm start`, or the app at BENCH_APP_URL) with autocannon,
// 20 connections for 20 s on each of the health route, an authenticated list (the Kit's models) and the engine
// (POST /api/compute with the example rig), and the engine's own rate in this process on one core. The goals are
// ratios measured in the same run, since the load generator shares the cores with the server; the 20 s are taken
// as rounds of the four in turn, so that a machine whose speed drifts (shared cores) weighs on all four alike.
import { readFileSync } from "node:fs";
import autocannon from "autocannon";
import { evaluateRig } from "../../physics";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../../seeds/01_demo_crew";

const APP_URL = process.env.BENCH_APP_URL ?? "http://127.0.0.1:3000";
const CONNECTIONS = 20;
const SECONDS = Number(process.env.BENCH_LOAD_SECONDS ?? 20);
const ROUNDS = 4;
/** Unmeasured load on each target first: a freshly started server compiles its hot paths in its first seconds. */
const WARM_UP_SECONDS = 3;
const rig = readFileSync(new URL("../../physics/examples/quarry-highline.json", import.meta.url), "utf8");

/** One target's load over all rounds: requests a second over its whole time, the median of the rounds' p99s. */
interface Figures {
  rate: number;
  p99: number;
  ok: number;
  other: number;
}

interface Round {
  requests: number;
  seconds: number;
  p99: number;
  ok: number;
  other: number;
}

async function signIn(): Promise<string> {
  const rigger = DEMO_PEOPLE.find((p) => p.role === "rigger")!;
  const response = await fetch(`${APP_URL}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: APP_URL },
    body: JSON.stringify({ email: rigger.email, password: DEMO_PASSWORD }),
  });
  if (response.status !== 200) throw new Error(`signing in as the demo rigger answered ${response.status}: is ${APP_URL} the demo stack of \`npm start\`?`);
  return response.headers
    .getSetCookie()
    .map((line) => line.split(";")[0])
    .join("; ");
}

/** What is loaded: the label printed is made from the same method and path that are requested. */
interface Target {
  method: "GET" | "POST";
  path: string;
  note?: string;
  headers?: Record<string, string>;
  body?: string;
}

const title = (target: Target) => `${target.method} ${target.path}${target.note ? `, ${target.note}` : ""}`;

/** One request to the target first: each must answer the JSON of its route, so that no figure measures something else. */
async function probe(target: Target): Promise<void> {
  const response = await fetch(`${APP_URL}${target.path}`, { method: target.method, headers: { origin: APP_URL, ...target.headers }, body: target.body });
  const type = response.headers.get("content-type") ?? "";
  if (!response.ok || !type.startsWith("application/json"))
    throw new Error(`${title(target)} answered ${response.status} ${type || "with no content type"}, not its route's JSON: nothing was measured.`);
  await response.arrayBuffer();
}

async function loadRound(target: Target, seconds = SECONDS / ROUNDS): Promise<Round> {
  const result = await autocannon({
    url: `${APP_URL}${target.path}`,
    method: target.method,
    connections: CONNECTIONS,
    duration: seconds,
    headers: { origin: APP_URL, ...target.headers },
    body: target.body,
  });
  return {
    requests: result.requests.total,
    seconds: result.duration,
    p99: result.latency.p99,
    ok: result["2xx"],
    other: result.non2xx + result.errors + result.timeouts,
  };
}

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = sorted.length / 2;
  return Number.isInteger(middle) ? (sorted[middle - 1] + sorted[middle]) / 2 : sorted[Math.floor(middle)];
};

function figures(target: Target, rounds: Round[]): Figures {
  const sum = (pick: (r: Round) => number) => rounds.reduce((total, r) => total + pick(r), 0);
  const result = {
    rate: sum((r) => r.requests) / sum((r) => r.seconds),
    p99: median(rounds.map((r) => r.p99)),
    ok: sum((r) => r.ok),
    other: sum((r) => r.other),
  };
  const perRound = rounds.map((r) => (r.requests / r.seconds).toFixed(0)).join(", ");
  console.log(
    `${title(target)}: ${result.rate.toFixed(0)} req/s (rounds: ${perRound}), p99 ${result.p99} ms, ${result.ok} answered 2xx, ${result.other} did not`,
  );
  return result;
}

/** Whole-rig evaluations a second in this process (one core), after a warm-up. */
function engineRate(seconds: number): { calls: number; seconds: number } {
  const input = JSON.parse(rig);
  const warm = performance.now() + 500;
  while (performance.now() < warm) evaluateRig(input);
  let calls = 0;
  const start = performance.now();
  while (performance.now() - start < seconds * 1000) {
    evaluateRig(input);
    calls++;
  }
  return { calls, seconds: (performance.now() - start) / 1000 };
}

async function main() {
  const health = await fetch(`${APP_URL}/api/health`).catch(() => null);
  if (!health?.ok)
    throw new Error(`nothing answers ${APP_URL}/api/health: start the production build with \`npm start\` (or set BENCH_APP_URL), then run this again.`);
  const cookie = await signIn();
  console.log(
    `Load on ${APP_URL}: ${CONNECTIONS} connections, ${SECONDS} s each, in ${ROUNDS} rounds of the four in turn after ${WARM_UP_SECONDS} s of unmeasured load on each (autocannon on the same cores as the server)\n`,
  );
  const targets: Record<"base" | "list" | "compute", Target> = {
    base: { method: "GET", path: "/api/health" },
    list: { method: "GET", path: "/api/kit/models", note: "signed in", headers: { cookie } },
    compute: { method: "POST", path: "/api/compute", note: "example rig", headers: { cookie, "content-type": "application/json" }, body: rig },
  };
  for (const target of Object.values(targets)) {
    await probe(target);
    await loadRound(target, WARM_UP_SECONDS);
  }
  const rounds = { base: [] as Round[], list: [] as Round[], compute: [] as Round[], engine: [] as { calls: number; seconds: number }[] };
  for (let round = 0; round < ROUNDS; round++) {
    rounds.base.push(await loadRound(targets.base));
    rounds.list.push(await loadRound(targets.list));
    rounds.compute.push(await loadRound(targets.compute));
    rounds.engine.push(engineRate(SECONDS / ROUNDS));
  }
  const base = figures(targets.base, rounds.base);
  const list = figures(targets.list, rounds.list);
  const compute = figures(targets.compute, rounds.compute);
  const engine = rounds.engine.reduce((total, r) => total + r.calls, 0) / rounds.engine.reduce((total, r) => total + r.seconds, 0);
  console.log(
    `evaluateRig in this process, one core: ${engine.toFixed(0)} /s (rounds: ${rounds.engine.map((r) => (r.calls / r.seconds).toFixed(0)).join(", ")})\n`,
  );

  const verdict = (met: boolean) => (met ? "met" : "not met");
  const rows = [
    ["Health route", `${base.rate.toFixed(0)} req/s, p99 ${base.p99} ms`, "baseline", ""],
    [
      "Kit list, signed in: rate against the health route's",
      `${((list.rate / base.rate) * 100).toFixed(0)} %`,
      "≥ 80 %",
      verdict(list.rate >= 0.8 * base.rate),
    ],
    ["Kit list: p99 against the health route's", `${(list.p99 / base.p99).toFixed(2)}× (${list.p99} ms)`, "≤ 3×", verdict(list.p99 <= 3 * base.p99)],
    [
      "Compute: rate against the engine in-process on one core",
      `${((compute.rate / engine) * 100).toFixed(0)} % (${compute.rate.toFixed(0)} of ${engine.toFixed(0)} /s)`,
      "≥ 70 %",
      verdict(compute.rate >= 0.7 * engine),
    ],
    ["Answers other than 2xx (all three runs)", String(base.other + list.other + compute.other), "0", verdict(base.other + list.other + compute.other === 0)],
  ];
  console.log("| Figure | Measured | Goal | |\n| --- | --- | --- | --- |");
  for (const row of rows) console.log(`| ${row.join(" | ")} |`);
}

main().catch((error) => {
  console.error(`bench:load: ${(error as Error).message}`);
  process.exit(1);
});
