import { capacityText, factorText, loadText, type DisplayUnits } from "./display";

/** One result from the crew's slip bench. "held" means the test stopped without a slip: F is only a lower bound. */
export interface SlipResult {
  device: string;
  ropeDiameterMm: number;
  result: "slipped" | "held";
  forceN: number;
}

export interface BrakeCheck {
  /** "holds_below_margin": it holds, but with a margin below the crew's minimum. */
  verdict: "holds" | "holds_below_margin" | "slips" | "untested";
  /** The crew's minimum margin it is held to. */
  minimumMargin: number;
  /** Force on the rope at the brake at peak line tension, N. */
  brakeForce: number;
  /** Lowest measured slip load for this device and diameter, N, or the highest held-to load when none slipped. */
  governingLoad: number | null;
  /** True when governingLoad is a held-to value: the true slip load is at least that. */
  lowerBoundOnly: boolean;
  /** governingLoad / brakeForce (a lower bound when lowerBoundOnly). */
  margin: number | null;
  /** Highest line tension the brake holds on this advantage, N (a lower bound when lowerBoundOnly). */
  highestLineTensionHeld: number | null;
  resultsUsed: number;
  message: string;
}

const sameDevice = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();
// Rope diameters are quoted to a tenth of a millimetre.
const sameDiameter = (a: number, b: number) => Math.round(a * 10) === Math.round(b * 10);

/**
 * Compares the force at the brake (line tension over the ideal advantage between brake and line) with the
 * bench's lowest slip load for that device on that rope diameter, and the margin with the crew's minimum.
 * A held-to result is never taken as a slip load.
 */
export function checkBrake(
  device: string,
  ropeDiameterMm: number,
  bench: readonly SlipResult[],
  peakLineTension: number,
  brakeAdvantage: number,
  minimumMargin: number,
  units: DisplayUnits = "si",
): BrakeCheck {
  const brakeForce = peakLineTension / brakeAdvantage;
  const results = bench.filter((r) => sameDevice(r.device, device) && sameDiameter(r.ropeDiameterMm, ropeDiameterMm));
  const slipped = results.filter((r) => r.result === "slipped").map((r) => r.forceN);
  const held = results.filter((r) => r.result === "held").map((r) => r.forceN);
  // The sentence is in the crew's units; the figures above stay in newtons.
  const load = (f: number) => loadText(f, units);
  const capacity = (f: number) => capacityText(f, units);
  const base = { brakeForce, resultsUsed: results.length, minimumMargin };
  const belowMargin = (margin: number) => margin < minimumMargin;
  const belowMinimum = `below the crew's minimum of ${minimumMargin}`;
  if (slipped.length > 0) {
    const slipLoad = Math.min(...slipped);
    const margin = slipLoad / brakeForce;
    const holds = brakeForce < slipLoad;
    const thin = holds && belowMargin(margin);
    return {
      ...base,
      verdict: !holds ? "slips" : thin ? "holds_below_margin" : "holds",
      governingLoad: slipLoad,
      lowerBoundOnly: false,
      margin,
      highestLineTensionHeld: slipLoad * brakeAdvantage,
      message: holds
        ? `${device} on ${ropeDiameterMm} mm holds: ${load(brakeForce)} at the brake against a lowest measured slip of ${capacity(slipLoad)} (margin ${factorText(margin)}${thin ? `, ${belowMinimum}` : ""}).`
        : `${device} on ${ropeDiameterMm} mm slips: ${load(brakeForce)} at the brake reaches its lowest measured slip of ${capacity(slipLoad)}.`,
    };
  }
  if (held.length > 0) {
    const heldTo = Math.max(...held);
    if (brakeForce <= heldTo) {
      const margin = heldTo / brakeForce;
      // A margin known only as "at least" counts as what is known of it.
      const thin = belowMargin(margin);
      return {
        ...base,
        verdict: thin ? "holds_below_margin" : "holds",
        governingLoad: heldTo,
        lowerBoundOnly: true,
        margin,
        highestLineTensionHeld: heldTo * brakeAdvantage,
        message: `${device} on ${ropeDiameterMm} mm held to ${capacity(heldTo)} on the bench without slipping; ${load(brakeForce)} at the brake is within that (margin at least ${factorText(margin)}${thin ? `, ${belowMinimum}` : ""}; the slip load itself was never measured).`,
      };
    }
    return {
      ...base,
      verdict: "untested",
      governingLoad: heldTo,
      lowerBoundOnly: true,
      margin: heldTo / brakeForce,
      highestLineTensionHeld: heldTo * brakeAdvantage,
      message: `${device} on ${ropeDiameterMm} mm was only tested to ${capacity(heldTo)}; ${load(brakeForce)} at the brake is beyond anything the bench has shown.`,
    };
  }
  return {
    ...base,
    verdict: "untested",
    governingLoad: null,
    lowerBoundOnly: false,
    margin: null,
    highestLineTensionHeld: null,
    message: `${device} has no slip results on ${ropeDiameterMm} mm rope: untested for this rope.`,
  };
}
