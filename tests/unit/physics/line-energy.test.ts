import { describe, expect, it } from "vitest";
import { lineEnergy, strainEnergyDensity, type LineVariables, type StretchPoint } from "../../../physics";
import { demoLine, relative, STRETCHY } from "./fixtures";

// The energy a stretched line stores, against models written here. Per unstretched metre it is ∫₀^ε T dε, the area
// under the load–elongation curve (strain energy, as in any strength-of-materials text): on straight pieces between
// measured points each strip of that area is a trapezoid, exact. For the whole line the density is summed along the
// unstretched arc s, where T(s) = √(H² + V(s)²) and V(s) = VA + w·s (+ P past the load), and the height follows
// dy/ds = (V/T)(1 + ε): both by the trapezoid rule on 40 000 steps a segment (its error, of order step², is under
// 1e-9 of each figure here).

/** ∫₀^ε T dε up to tension t (N), by trapezoids on the measured points; the last stiffness carries on past them. */
function areaUnderCurve(points: StretchPoint[], t: number): number {
  let area = 0;
  for (let i = 0; i + 1 < points.length; i++) {
    const [t0, t1] = [points[i].tensionKN * 1000, points[i + 1].tensionKN * 1000];
    const [e0, e1] = [points[i].elongationPct / 100, points[i + 1].elongationPct / 100];
    const top = i + 2 < points.length ? Math.min(t, t1) : t;
    if (top <= t0) break;
    area += (((t0 + top) / 2) * ((e1 - e0) * (top - t0))) / (t1 - t0);
  }
  return area;
}

/** Strain at tension t (N), straight between the measured points and past the last one. */
function strainOf(points: StretchPoint[], t: number): number {
  let i = 0;
  while (i + 2 < points.length && points[i + 1].tensionKN * 1000 <= t) i++;
  const [t0, t1] = [points[i].tensionKN * 1000, points[i + 1].tensionKN * 1000];
  const [e0, e1] = [points[i].elongationPct / 100, points[i + 1].elongationPct / 100];
  return e0 + ((e1 - e0) * (t - t0)) / (t1 - t0);
}

describe("strainEnergyDensity", () => {
  const curve = demoLine(60, 0, 0.06, STRETCHY).curve;

  it("is the area under the load–elongation curve, worked by hand at and between the measured points", () => {
    // STRETCHY: 1 kN at 1.5 %, 3 kN at 3.4 %. To 1 kN, a triangle: 1000 · 0.015 / 2 = 7.5 J/m; to 2 kN (2.45 %) a
    // trapezoid more, (1000 + 2000)/2 · 0.0095 = 14.25; to 3 kN, (1000 + 3000)/2 · 0.019 = 38.
    expect(strainEnergyDensity(curve, 0)).toBe(0);
    expect(strainEnergyDensity(curve, 500)).toBeCloseTo(1.875, 12);
    expect(strainEnergyDensity(curve, 1000)).toBeCloseTo(7.5, 12);
    expect(strainEnergyDensity(curve, 2000)).toBeCloseTo(21.75, 12);
    expect(strainEnergyDensity(curve, 3000)).toBeCloseTo(45.5, 12);
  });

  it("agrees with the trapezoids up to and past the last measured point", () => {
    for (const t of [250, 1000, 4500, 6000, 9999, 10_000, 14_000]) {
      expect(relative(strainEnergyDensity(curve, t), areaUnderCurve(STRETCHY, t))).toBeLessThan(1e-12);
    }
  });
});

describe("lineEnergy", () => {
  const line = demoLine(60, 1, 0.06, STRETCHY);
  const w = line.weight;

  /** Strain energy ∫ e(T) ds and the potential ∫ w·y ds of the line's own weight, by the trapezoid rule along s. */
  function byQuadrature(v: LineVariables): { strain: number; gravity: number; scale: number } {
    const steps = 40_000;
    let strain = 0;
    let gravity = 0;
    let y = 0;
    let highest = 0;
    for (const [from, to, jump] of [
      [0, v.loadArc, 0],
      [v.loadArc, v.length, v.load],
    ]) {
      const at = (s: number) => {
        const V = v.VA + w * s + jump;
        const T = Math.hypot(v.H, V);
        return { e: areaUnderCurve(STRETCHY, T), rise: (V / T) * (1 + strainOf(STRETCHY, T)) };
      };
      const h = (to - from) / steps;
      let previous = at(from);
      for (let i = 1; i <= steps; i++) {
        const current = at(from + i * h);
        strain += (h * (previous.e + current.e)) / 2;
        const next = y + (h * (previous.rise + current.rise)) / 2;
        gravity += (w * h * (y + next)) / 2;
        y = next;
        highest = Math.max(highest, Math.abs(y));
        previous = current;
      }
    }
    return { strain, gravity, scale: w * v.length * highest };
  }

  // Tensions across the curve's measured points (1, 3, 6 and 10 kN) in each way the closed form splits its pieces.
  const states: [string, LineVariables][] = [
    ["H between points, V through zero before the load, T past 3 kN after it", { H: 2000, VA: -5, loadArc: 20, load: 4000, length: 60 }],
    ["T through a measured point above H (3 kN) between an anchor and the load", { H: 2000, VA: -2250, loadArc: 40, load: 3000, length: 60 }],
    ["H on a measured point (3 kN)", { H: 3000, VA: -2500, loadArc: 20, load: 6000, length: 60 }],
    ["H past three points, T past the last measured point", { H: 7000, VA: -6000, loadArc: 35, load: 16_000, length: 60 }],
    ["no load, H under the first point", { H: 600, VA: -17, loadArc: 30, load: 0, length: 60 }],
  ];
  it.each(states)("%s: strain energy and weight's potential as summed along the line", (_, v) => {
    const engine = lineEnergy(line, v);
    const reference = byQuadrature(v);
    expect(relative(engine.strain, reference.strain)).toBeLessThan(1e-8);
    expect(Math.abs(engine.gravity - reference.gravity)).toBeLessThan(1e-8 * reference.scale);
  });
});
