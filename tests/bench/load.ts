// `npm run bench:load`: load on the production build (`npm start`, or the app at BENCH_APP_URL) with autocannon,
// 20 connections for 20 s on each of the health route, a signed-in route that reads nothing but the session (the
// caller's crews), an authenticated list (the Kit's models) and the engine (POST /api/compute with the example rig),
// and the engine's own rate in this process on one core. The goals are ratios measured in the same run, since the
// load generator shares the cores with the server; the 20 s are taken as rounds of all of them in turn, so that a
// machine whose speed drifts (shared cores) weighs on all alike. Where /proc/stat exists (Linux), the machine's
// busy CPU time a request is measured too: it bounds what any route can reach on these cores.
import { execFileSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { cpus } from "node:os";
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
  /** The whole machine's busy CPU time a request (server, database, load generator, kernel), in ms; null off Linux. */
  cpuMs: number | null;
}

interface Round {
  requests: number;
  seconds: number;
  p99: number;
  ok: number;
  other: number;
  busyMs: number | null;
}

const CLOCK_TICKS_PER_SECOND = existsSync("/proc/stat") ? Number(execFileSync("getconf", ["CLK_TCK"], { encoding: "utf8" })) : 0;

/** CPU time all cores spent busy since boot, in ms (user, nice, system, irq, softirq: not idle, I/O wait or steal). */
function machineBusyMs(): number | null {
  if (!CLOCK_TICKS_PER_SECOND) return null;
  const [user, nice, system, , , irq, softirq] = readFileSync("/proc/stat", "utf8").split("\n")[0].trim().split(/\s+/).slice(1).map(Number);
  return ((user + nice + system + irq + softirq) * 1000) / CLOCK_TICKS_PER_SECOND;
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
  const busyBefore = machineBusyMs();
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
    busyMs: busyBefore === null ? null : machineBusyMs()! - busyBefore,
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
    cpuMs: rounds.every((r) => r.busyMs !== null) ? sum((r) => r.busyMs!) / sum((r) => r.requests) : null,
  };
  const perRound = rounds.map((r) => (r.requests / r.seconds).toFixed(0)).join(", ");
  const cpu = result.cpuMs === null ? "" : `, machine CPU ${result.cpuMs.toFixed(2)} ms a request`;
  console.log(
    `${title(target)}: ${result.rate.toFixed(0)} req/s (rounds: ${perRound}), p99 ${result.p99} ms${cpu}, ${result.ok} answered 2xx, ${result.other} did not`,
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
    `Load on ${APP_URL}: ${CONNECTIONS} connections, ${SECONDS} s each, in ${ROUNDS} rounds of all of them in turn after ${WARM_UP_SECONDS} s of unmeasured load on each (autocannon on the same cores as the server)\n`,
  );
  const targets: Record<"base" | "session" | "list" | "compute", Target> = {
    base: { method: "GET", path: "/api/health" },
    session: { method: "GET", path: "/api/crews", note: "signed in, the session read alone", headers: { cookie } },
    list: { method: "GET", path: "/api/kit/models", note: "signed in", headers: { cookie } },
    compute: { method: "POST", path: "/api/compute", note: "example rig", headers: { cookie, "content-type": "application/json" }, body: rig },
  };
  for (const target of Object.values(targets)) {
    await probe(target);
    await loadRound(target, WARM_UP_SECONDS);
  }
  const rounds = {
    base: [] as Round[],
    session: [] as Round[],
    list: [] as Round[],
    compute: [] as Round[],
    engine: [] as { calls: number; seconds: number }[],
  };
  for (let round = 0; round < ROUNDS; round++) {
    rounds.base.push(await loadRound(targets.base));
    rounds.session.push(await loadRound(targets.session));
    rounds.list.push(await loadRound(targets.list));
    rounds.compute.push(await loadRound(targets.compute));
    rounds.engine.push(engineRate(SECONDS / ROUNDS));
  }
  const base = figures(targets.base, rounds.base);
  const session = figures(targets.session, rounds.session);
  const list = figures(targets.list, rounds.list);
  const compute = figures(targets.compute, rounds.compute);
  const engine = rounds.engine.reduce((total, r) => total + r.calls, 0) / rounds.engine.reduce((total, r) => total + r.seconds, 0);
  console.log(
    `evaluateRig in this process, one core: ${engine.toFixed(0)} /s (rounds: ${rounds.engine.map((r) => (r.calls / r.seconds).toFixed(0)).join(", ")})\n`,
  );

  const verdict = (met: boolean) => (met ? "met" : "not met");
  const percent = (part: number, whole: number) => `${((part / whole) * 100).toFixed(0)} %`;
  const others = base.other + session.other + list.other + compute.other;
  const rows = [
    ["Health route", `${base.rate.toFixed(0)} req/s, p99 ${base.p99} ms`, "baseline", ""],
    ["Signed in, the session read alone (the caller's crews): rate against the health route's", percent(session.rate, base.rate), "for comparison", ""],
    ["Kit list, signed in: rate against the health route's", percent(list.rate, base.rate), "≥ 80 %", verdict(list.rate >= 0.8 * base.rate)],
    ["Kit list: p99 against the health route's", `${(list.p99 / base.p99).toFixed(2)}× (${list.p99} ms)`, "≤ 3×", verdict(list.p99 <= 3 * base.p99)],
    [
      "Compute: rate against the engine in-process on one core",
      `${percent(compute.rate, engine)} (${compute.rate.toFixed(0)} of ${engine.toFixed(0)} /s)`,
      "≥ 70 %",
      verdict(compute.rate >= 0.7 * engine),
    ],
  ];
  if (session.cpuMs !== null) {
    // A compute request costs at least what a signed-in request costs the machine, plus one evaluation of the rig:
    // however the server were built, these cores cannot answer more of them a second than this. All the machine's
    // cores, as /proc/stat counts them, whatever this process's own affinity.
    const cores = cpus().length;
    const ceiling = (cores * 1000) / (session.cpuMs + 1000 / engine);
    rows.push([
      `Compute's ceiling on these ${cores} cores: their time over (a signed-in request's machine CPU, ${session.cpuMs.toFixed(2)} ms, plus one evaluation, ${(1000 / engine).toFixed(2)} ms), against the engine's rate`,
      `${percent(ceiling, engine)} (${ceiling.toFixed(0)} /s)`,
      "for comparison",
      "",
    ]);
  }
  rows.push(["Answers other than 2xx (all four targets)", String(others), "0", verdict(others === 0)]);
  console.log("| Figure | Measured | Goal | |\n| --- | --- | --- | --- |");
  for (const row of rows) console.log(`| ${row.join(" | ")} |`);
}

main().catch((error) => {
  console.error(`bench:load: ${(error as Error).message}`);
  process.exit(1);
});
