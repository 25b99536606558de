import { startingShape, tensionOf, walkerNodeOf, type ManyNodeLine, type ManyNodeResult } from "../unit/physics/reference/many-node-line";

/**
 * The same many-node line solved the general-purpose way: dynamic relaxation (Day 1965; Barnes,
 * "Form finding and analysis of tension structures by dynamic relaxation", 1999). Each free node gets a
 * fictitious lumped mass m_i = Δt²/2 · Σ k_e over its two elements (Δt = 1), with k_e = axial tangent
 * stiffness / l₀ + tension / l, so the explicit step is stable; the nodes are stepped explicitly
 * (central differences) under the out-of-balance force, and kinetic damping stops them at every peak
 * of the kinetic energy, placing them back at the peak. It stops when the largest out-of-balance force
 * at any node is below tolerance × max(walker, line weight). Only the description, the stretch law
 * and the starting shape are shared with the Newton model; no engine code.
 */
/** Out-of-balance tolerance (fraction of the larger of walker and line weight) that reaches 0.2 % agreement with the engine on the test rigs. */
export const RELAXATION_TOLERANCE = 1e-4;

export function relaxManyNodeLine(line: ManyNodeLine, tolerance: number, maxSteps = 2_000_000): ManyNodeResult {
  const n = line.elements;
  const l0 = line.length / n;
  const walkerNode = walkerNodeOf(line);
  // The stiffest piece of the stretch law sets the axial part of every mass: an element that stretches
  // into a stiffer piece within a step must not outrun its node's mass.
  let stiffest = 0;
  for (let k = 1; k < line.tensions.length; k++)
    stiffest = Math.max(stiffest, (line.tensions[k] - line.tensions[k - 1]) / (line.strains[k] - line.strains[k - 1]));
  const { x, y, load } = startingShape(line);
  const vx = new Float64Array(n + 1);
  const vy = new Float64Array(n + 1);
  const fx = new Float64Array(n + 1);
  const fy = new Float64Array(n + 1);
  const mass = new Float64Array(n + 1);
  const tension = new Float64Array(n);
  const scale = Math.max(line.walkerForce, line.weight * line.length);

  /** Out-of-balance forces and nodal masses at the current positions; returns the largest force. */
  function outOfBalance(): number {
    fx.fill(0);
    mass.fill(0);
    for (let i = 1; i < n; i++) fy[i] = -load[i];
    for (let e = 0; e < n; e++) {
      const dx = x[e + 1] - x[e];
      const dy = y[e + 1] - y[e];
      const l = Math.sqrt(dx * dx + dy * dy);
      const T = tensionOf(line, l / l0 - 1).tension;
      tension[e] = T;
      const k = stiffest / l0 + T / l;
      const cx = (T * dx) / l;
      const cy = (T * dy) / l;
      fx[e] += cx;
      fy[e] += cy;
      fx[e + 1] -= cx;
      fy[e + 1] -= cy;
      mass[e] += k / 2;
      mass[e + 1] += k / 2;
    }
    let largest = 0;
    for (let i = 1; i < n; i++) largest = Math.max(largest, Math.abs(fx[i]), Math.abs(fy[i]));
    return largest;
  }

  let residual = outOfBalance();
  let kinetic = 0;
  let restart = true;
  for (let step = 1; step <= maxSteps; step++) {
    if (residual < tolerance * scale) {
      return { tensionA: tension[0], tensionB: tension[n - 1], walkerX: x[walkerNode], walkerY: y[walkerNode], iterations: step };
    }
    // v(t + ½) = v(t − ½) + R/m (half of that right after a reset), then x(t + 1) = x(t) + v(t + ½).
    const kick = restart ? 0.5 : 1;
    let energy = 0;
    for (let i = 1; i < n; i++) {
      vx[i] += (kick * fx[i]) / mass[i];
      vy[i] += (kick * fy[i]) / mass[i];
      energy += mass[i] * (vx[i] * vx[i] + vy[i] * vy[i]);
    }
    if (!restart && energy < kinetic) {
      // Kinetic energy peaked about half a step back: put the nodes there (Barnes's correction,
      // x* = x(t) − ½v(t + ½) + ½R(t)/m), stop them and start again.
      for (let i = 1; i < n; i++) {
        x[i] += (0.5 * fx[i]) / mass[i] - 0.5 * vx[i];
        y[i] += (0.5 * fy[i]) / mass[i] - 0.5 * vy[i];
        vx[i] = 0;
        vy[i] = 0;
      }
      kinetic = 0;
      restart = true;
    } else {
      for (let i = 1; i < n; i++) {
        x[i] += vx[i];
        y[i] += vy[i];
      }
      kinetic = energy;
      restart = false;
    }
    residual = outOfBalance();
  }
  throw new Error(`dynamic relaxation did not settle in ${maxSteps} steps (out-of-balance ${residual.toExponential(2)} N)`);
}
