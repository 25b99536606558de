import { readFileSync } from "node:fs";
import { createStretchCurve, detectSlip, evaluateRig, lengthForPretension, solveLine, STANDARD_GRAVITY, type Line } from "../../physics";
import { manyNodeLine, solveManyNodeLine } from "../unit/physics/reference/many-node-line";
import type { Benchmark, Ratio } from "./benchmark";
import { relaxManyNodeLine, RELAXATION_TOLERANCE } from "./dynamic-relaxation-line";

// An invented 150 m longline on a four-point stretch curve.
const points = [
  { tensionKN: 0, elongationPct: 0 },
  { tensionKN: 1, elongationPct: 1.5 },
  { tensionKN: 3, elongationPct: 3.4 },
  { tensionKN: 6, elongationPct: 5.2 },
  { tensionKN: 10, elongationPct: 7 },
];
const line: Line = { span: 150, rise: 3, weight: 0.05 * STANDARD_GRAVITY, curve: createStretchCurve(points) };
const mbs = 30000;
const length = lengthForPretension(line, 4000, "a", mbs).variables.length;
const walker = 80 * STANDARD_GRAVITY;
const manyNode = manyNodeLine(line, length, points, walker, 0.3, 400);
// The engine solves the same rig at the walker position the many-node model settles to (they agree within 0.2 %).
const walkerX = solveManyNodeLine(manyNode).walkerX;
// The ratio is only honest if dynamic relaxation, run to its tolerance, agrees with the engine within 0.2 %.
{
  const relaxed = relaxManyNodeLine(manyNode, RELAXATION_TOLERANCE);
  const engine = solveLine(line, length, { force: walker, x: relaxed.walkerX }, mbs);
  const sag = (line.rise * relaxed.walkerX) / line.span - relaxed.walkerY;
  const worst = Math.max(
    ...[
      [engine.tensionA, relaxed.tensionA],
      [engine.tensionB, relaxed.tensionB],
      [engine.loadSag, sag],
    ].map(([a, b]) => Math.abs(a - b) / Math.abs(b)),
  );
  if (!(worst < 2e-3)) throw new Error(`dynamic relaxation agrees with the engine only to ${(worst * 100).toFixed(3)} %, not 0.2 %`);
}

const rig = JSON.parse(readFileSync(new URL("../../physics/examples/quarry-highline.json", import.meta.url), "utf8"));
// The same rig with its ground and a backup stretch curve: the backup catch and the lowest clearances over the span.
const rigWithGround = JSON.parse(readFileSync(new URL("../../physics/examples/quarry-highline-ground.json", import.meta.url), "utf8"));

// A slow pull of 1,000,000 samples with noise, slipping at 8 kN.
const samples = 1_000_000;
const time = new Float64Array(samples);
const force = new Float64Array(samples);
for (let i = 0; i < samples; i++) {
  time[i] = i * 1e-4;
  force[i] = i * 0.01 + 5 * Math.sin(i * 0.37) - (i * 0.01 > 8000 ? 500 : 0);
}

export const benchmarks: Benchmark[] = [
  {
    name: "One equilibrium solve, nonlinear curve (150 m, walker at 30 %)",
    goal: "≤ 20 µs",
    run: () => solveLine(line, length, { force: walker, x: walkerX }, mbs),
    batch: 200,
  },
  { name: "Full evaluateRig, plain example rig (101-point sweep, leash fall)", goal: "≤ 1.5 ms", run: () => evaluateRig(rig), batch: 3 },
  {
    name: "Full evaluateRig with ground and backup (also the backup catch, lowest clearances over the span)",
    goal: "≤ 5 ms",
    run: () => evaluateRig(rigWithGround),
    batch: 3,
  },
  { name: "Slip detection, 1,000,000-sample trace", goal: "≤ 200 ms", run: () => detectSlip({ time, force }, 200), samples: 9 },
  {
    name: "Independent many-node model, same rig (400 elements), Newton on node positions",
    goal: "reference",
    run: () => solveManyNodeLine(manyNode),
    samples: 9,
  },
  {
    name: "Same many-node model by dynamic relaxation to 0.2 % agreement",
    goal: "reference",
    run: () => relaxManyNodeLine(manyNode, RELAXATION_TOLERANCE),
    samples: 5,
  },
];

export const ratios: Ratio[] = [
  { name: "Engine vs dynamic-relaxation model, same rig, agreement within 0.2 %", goal: "≥ 1000× faster", fast: benchmarks[0].name, slow: benchmarks[5].name },
  { name: "Engine vs Newton many-node model, same rig, agreement within 0.2 %", goal: "(for comparison)", fast: benchmarks[0].name, slow: benchmarks[4].name },
];
