import { analyseTrace } from "../../lib/trace-analysis";
import { parseTraceCsv } from "../../lib/trace-csv";
import { sha256Hex, checkFileType } from "../../lib/uploads";
import type { Benchmark } from "./benchmark";

// An invented 1,000,000-row load-cell trace as a tester's CSV: a slow pull in kN with noise, slipping at 8 kN.
const rows = 1_000_000;
const lines = ["time_s;force_kN"];
for (let i = 0; i < rows; i++) {
  const force = i * 1e-5 + 0.005 * Math.sin(i * 0.37) - (i * 1e-5 > 8 ? 0.5 : 0);
  lines.push(`${(i * 1e-4).toFixed(4).replace(".", ",")};${force.toFixed(4).replace(".", ",")}`);
}
const bytes = new TextEncoder().encode(lines.join("\n"));
lines.length = 0;

/** What the trace route does with an uploaded file on the server, short of the S3 and database writes. */
function serverPipeline() {
  checkFileType("trace", "pull.csv", bytes);
  const digest = sha256Hex(bytes);
  const trace = parseTraceCsv(new TextDecoder().decode(bytes), "kN");
  return { digest, analysis: analyseTrace(trace, "kN", 200) };
}

const before = process.memoryUsage().rss;
const first = serverPipeline();
if (first.analysis.onset.kind !== "slipped" || Math.abs(first.analysis.onset.forceN - 8000) > 20) {
  throw new Error(`the benchmark trace should slip at 8 kN, got ${JSON.stringify(first.analysis.onset)}`);
}
// Peak resident memory of this whole benchmark process (other modules' data included): an upper bound.
console.log(
  `trace upload: ${(bytes.byteLength / 1048576).toFixed(1)} MiB CSV; process RSS before ${(before / 1048576).toFixed(0)} MiB, peak ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MiB`,
);

export const benchmarks: Benchmark[] = [
  { name: "Trace upload on the server: type check, SHA-256, parse and detect, 1,000,000 rows", goal: "≤ 3 s end to end, ≤ 300 MB peak", run: serverPipeline, samples: 5 },
];
