import { execFileSync } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { analyseTrace } from "../../lib/trace-analysis";
import { parseTraceCsv } from "../../lib/trace-csv";
import { checkFileType } from "../../lib/uploads";
import { sha256Hex } from "../../lib/sha256";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../../seeds/01_demo_crew";
import type { Benchmark } from "./benchmark";

// A 1,000,000-row load-cell trace through what the trace route does on the server: type check by
// content, SHA-256, UTF-8 decoding, CSV parsing and the engine's slip detection (S3 and the database
// write are not included). Peak memory is measured in a child process that does only this, once.
// With BENCH_APP_URL set to a running app (`npm start`), the same file is also uploaded over HTTP as
// the demo rigger, timing the whole round trip: upload, parse, detect, S3 and database.

/** An invented slow pull as a tester's CSV: semicolons, decimal commas, kN, with noise, slipping at 8 kN. */
function benchCsv(rows: number): Uint8Array {
  const chunks: string[] = ["time_s;force_kN\n"];
  for (let start = 0; start < rows; start += 10_000) {
    const lines: string[] = [];
    for (let i = start; i < Math.min(rows, start + 10_000); i++) {
      const force = i * 1e-5 + 0.005 * Math.sin(i * 0.37) - (i * 1e-5 > 8 ? 0.5 : 0);
      lines.push(`${(i * 1e-4).toFixed(4).replace(".", ",")};${force.toFixed(4).replace(".", ",")}\n`);
    }
    chunks.push(lines.join(""));
  }
  return new TextEncoder().encode(chunks.join(""));
}

function serverPipeline(bytes: Uint8Array) {
  checkFileType("trace", "pull.csv", bytes);
  const sha256 = sha256Hex(bytes);
  const trace = parseTraceCsv(new TextDecoder("utf-8", { fatal: true }).decode(bytes), "kN");
  return { sha256, analysis: analyseTrace(trace, "kN", 200) };
}

/** One upload through the running app, signed in as the demo rigger; prints the round trip in ms. */
async function uploadOverHttp(appUrl: string, file: string) {
  const origin = { origin: appUrl };
  const signIn = await fetch(`${appUrl}/api/auth/sign-in`, {
    method: "POST",
    headers: { ...origin, "content-type": "application/json" },
    body: JSON.stringify({ email: DEMO_PEOPLE.find((p) => p.role === "rigger")!.email, password: DEMO_PASSWORD }),
  });
  if (!signIn.ok) throw new Error(`sign-in answered ${signIn.status}`);
  const cookie = signIn.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
  const form = new FormData();
  form.append("file", new Blob([readFileSync(file)], { type: "text/csv" }), "bench-1m.csv");
  form.append("unit", "kN");
  form.append("drop", "0.2");
  const start = performance.now();
  const response = await fetch(`${appUrl}/api/slip-tests/traces`, { method: "POST", headers: { ...origin, cookie }, body: form });
  const body = await response.json();
  const ms = performance.now() - start;
  if (response.status !== 201) throw new Error(`the trace upload answered ${response.status}: ${body.error}`);
  console.log(JSON.stringify({ ms, onset: body.analysis.onset }));
}

/** In a child process: one pipeline run on the file (memory and time), or one upload over HTTP. */
async function childRun(file: string, appUrl: string | undefined) {
  if (appUrl) return uploadOverHttp(appUrl, file);
  const bytes = new Uint8Array(readFileSync(file));
  const rssBefore = process.memoryUsage().rss;
  const start = performance.now();
  const { analysis } = serverPipeline(bytes);
  const ms = performance.now() - start;
  console.log(JSON.stringify({ ms, rssBefore, maxRss: process.resourceUsage().maxRSS * 1024, onset: analysis.onset }));
}

/** In the bench process: the fresh-process figures, printed above the table of medians. */
function reportFreshProcess(bytes: Uint8Array) {
  const file = join(tmpdir(), "spanwright-bench-trace-1m.csv");
  writeFileSync(file, bytes);
  const runChild = (env: Record<string, string>) =>
    JSON.parse(
      execFileSync(process.execPath, [...process.execArgv, fileURLToPath(import.meta.url)], { env: { ...process.env, ...env }, encoding: "utf8" })
        .trim()
        .split("\n")
        .pop()!,
    );
  const MiB = 1024 * 1024;
  const child = runChild({ TRACE_BENCH_FILE: file });
  if (child.onset.kind !== "slipped" || Math.abs(child.onset.forceN - 8000) > 20)
    throw new Error(`the benchmark trace should slip at 8 kN, got ${JSON.stringify(child.onset)}`);
  console.log(
    `Trace upload, 1,000,000 rows (${(bytes.byteLength / MiB).toFixed(1)} MiB of CSV), one run in a fresh process: ${(child.ms / 1000).toFixed(2)} s; ` +
      `peak RSS ${(child.maxRss / MiB).toFixed(0)} MiB (${(child.rssBefore / MiB).toFixed(0)} MiB before the upload, file bytes included); goal ≤ 3 s, ≤ 300 MB peak.\n`,
  );
  const appUrl = process.env.BENCH_APP_URL;
  if (appUrl) {
    const http = runChild({ TRACE_BENCH_FILE: file, TRACE_BENCH_HTTP: appUrl });
    console.log(
      `The same trace uploaded to ${appUrl} over HTTP (parse, detect, S3 and database included): ${(http.ms / 1000).toFixed(2)} s, onset ${JSON.stringify(http.onset)}.\n`,
    );
  }
}

const childFile = process.env.TRACE_BENCH_FILE;
if (childFile) {
  childRun(childFile, process.env.TRACE_BENCH_HTTP).then(
    () => process.exit(0),
    (error) => {
      console.error(error);
      process.exit(1);
    },
  );
}
const bytes = childFile ? new Uint8Array() : benchCsv(1_000_000);
if (!childFile) reportFreshProcess(bytes);

export const benchmarks: Benchmark[] = [
  {
    name: "Trace upload on the server: type check, SHA-256, parse, detect, 1,000,000 rows",
    goal: "≤ 3 s end to end",
    run: () => serverPipeline(bytes),
    samples: 5,
  },
];
