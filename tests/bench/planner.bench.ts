import { execFileSync } from "node:child_process";
import { join } from "node:path";
import type { Benchmark } from "./benchmark";
import { evaluatePlanner } from "../../components/rigs/evaluation";
import { startingRig } from "../../lib/rig-form/starting-rig";
import { DEFAULT_MINIMUM_CLEARANCE_M } from "../../physics";

// The planner: one recompute of a rig as the browser does it on every walker move (Kit preparation and
// the whole engine), timed here in Node; and, with BENCH_APP_URL set to a running app (`npm start`),
// the planner page in Chromium: its first-load JavaScript as sent (gzipped) and the time from each
// pointer move to the next frame with the figures and diagram redrawn, over 200 moves of a drag.

const values = { ...startingRig({}, DEFAULT_MINIMUM_CLEARANCE_M), siteId: null };
const empty = { models: [], bench: [] };

function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

const appUrl = process.env.BENCH_APP_URL;
if (appUrl) {
  const out = execFileSync(join(__dirname, "..", "..", "node_modules", ".bin", "tsx"), [join(__dirname, "planner-in-browser.ts")], {
    env: process.env,
    encoding: "utf8",
    stdio: ["ignore", "pipe", "inherit"],
  });
  const { firstLoadBytes, commits, frames } = JSON.parse(out) as { firstLoadBytes: number; commits: number[]; frames: number[] };
  const spread = (times: number[]) => `median ${percentile(times, 50).toFixed(1)} ms, p95 ${percentile(times, 95).toFixed(1)} ms`;
  console.log(
    `Planner page at ${appUrl} in Chromium: first-load JavaScript ${(firstLoadBytes / 1024).toFixed(0)} kB as sent (gzipped), goal ≤ 250 kB. ` +
      `Dragging the walker, ${commits.length} moves: pointer event to figures and diagram updated (recompute and redraw) ${spread(commits)}, goal p95 ≤ 16 ms (aim 8 ms); ` +
      `to the next frame that shows them ${spread(frames)}.\n`,
  );
} else {
  console.log("Planner page in Chromium: set BENCH_APP_URL to a running app (npm start) to measure its first-load JavaScript and the walker drag.\n");
}

export const benchmarks: Benchmark[] = [
  {
    name: "Planner recompute per walker move (Kit preparation and whole-rig evaluation, example rig)",
    goal: "part of the 16 ms frame",
    run: () => evaluatePlanner(values, empty, null, "si"),
    batch: 20,
  },
];
