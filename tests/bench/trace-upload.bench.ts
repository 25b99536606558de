import { execFileSync } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { analyseTrace } from "../../lib/trace-analysis";
import { parseTraceCsv } from "../../lib/trace-csv";
import { checkFileType, sha256Hex } from "../../lib/uploads";
import type { Benchmark } from "./benchmark";

// A 1,000,000-row load-cell trace through what the trace route does on the server: type check by
// content, SHA-256, UTF-8 decoding, CSV parsing and the engine's slip detection (S3 and the database
// write are not included). Peak memory is measured in a child process that does only this, once.

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

const childFile = process.env.TRACE_BENCH_FILE;
if (childFile) {
  const bytes = new Uint8Array(readFileSync(childFile));
  const rssBefore = process.memoryUsage().rss;
  const start = performance.now();
  const { analysis } = serverPipeline(bytes);
  const ms = performance.now() - start;
  console.log(JSON.stringify({ ms, rssBefore, maxRss: process.resourceUsage().maxRSS * 1024, onset: analysis.onset }));
  process.exit(0);
}

const bytes = benchCsv(1_000_000);
const file = join(tmpdir(), "spanwright-bench-trace-1m.csv");
writeFileSync(file, bytes);
const child = JSON.parse(
  execFileSync(process.execPath, [...process.execArgv, fileURLToPath(import.meta.url)], { env: { ...process.env, TRACE_BENCH_FILE: file }, encoding: "utf8" }).trim().split("\n").pop()!,
);
if (child.onset.kind !== "slipped" || Math.abs(child.onset.forceN - 8000) > 20) throw new Error(`the benchmark trace should slip at 8 kN, got ${JSON.stringify(child.onset)}`);
const MiB = 1024 * 1024;
console.log(
  `Trace upload, 1,000,000 rows (${(bytes.byteLength / MiB).toFixed(1)} MiB of CSV), one run in a fresh process: ${(child.ms / 1000).toFixed(2)} s; ` +
    `peak RSS ${(child.maxRss / MiB).toFixed(0)} MiB (${(child.rssBefore / MiB).toFixed(0)} MiB before the upload, file bytes included); goal ≤ 3 s, ≤ 300 MB peak.\n`,
);

export const benchmarks: Benchmark[] = [
  { name: "Trace upload on the server: type check, SHA-256, parse, detect, 1,000,000 rows", goal: "≤ 3 s end to end", run: () => serverPipeline(bytes), samples: 5 },
];
