// Runs every *.bench.ts module beside this file and prints a Markdown table of medians. Optional arguments
// narrow it: `npm run bench -- physics evaluateRig` runs only the files whose name contains the first (the
// others are not even loaded: some prepare large inputs) and, of those, the benchmarks whose name contains the second.
import { readdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import type { Benchmark, Ratio } from "./benchmark";

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** Median time of one call, in ms. */
function measure(b: Benchmark): number {
  const batch = b.batch ?? 1;
  // Warm up for a quarter of a second so the JIT has compiled the code being timed.
  const warmUntil = performance.now() + 250;
  while (performance.now() < warmUntil) b.run();
  const times: number[] = [];
  for (let s = 0; s < (b.samples ?? 15); s++) {
    const start = performance.now();
    for (let i = 0; i < batch; i++) b.run();
    times.push((performance.now() - start) / batch);
  }
  return median(times);
}

function formatTime(ms: number): string {
  if (ms < 1) return `${(ms * 1000).toFixed(1)} µs`;
  if (ms < 1000) return `${ms.toFixed(2)} ms`;
  return `${(ms / 1000).toFixed(2)} s`;
}

async function main() {
  const here = dirname(fileURLToPath(import.meta.url));
  const [fileFilter = "", nameFilter = ""] = process.argv.slice(2).map((a) => a.toLowerCase());
  const rows: string[] = [];
  for (const file of readdirSync(here)
    .filter((f) => f.endsWith(".bench.ts") && f.toLowerCase().includes(fileFilter))
    .sort()) {
    const benchFile: { benchmarks?: Benchmark[]; ratios?: Ratio[] } = await import(pathToFileURL(join(here, file)).href);
    const medians = new Map<string, number>();
    for (const b of (benchFile.benchmarks ?? []).filter((b) => b.name.toLowerCase().includes(nameFilter))) {
      const ms = measure(b);
      medians.set(b.name, ms);
      rows.push(`| ${b.name} | ${formatTime(ms)} | ${b.goal} |`);
    }
    for (const r of (benchFile.ratios ?? []).filter((r) => medians.has(r.fast) && medians.has(r.slow))) {
      const ratio = (medians.get(r.slow) ?? NaN) / (medians.get(r.fast) ?? NaN);
      rows.push(`| ${r.name} | ${ratio.toFixed(0)}× | ${r.goal} |`);
    }
  }
  console.log(`Medians on this machine (Node ${process.version}):\n`);
  console.log("| Benchmark | Median | Goal |\n| --- | --- | --- |");
  console.log(rows.join("\n"));
}

void main();
