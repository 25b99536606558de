import { RigInputError, SolveError, capacityText, tensionForSag, tensionWithWalker } from "@/physics";
import { formatDistance } from "@/lib/rig-form/format";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import type { ReadingBody } from "@/lib/validations/review";

// The engine's prediction for a load-cell reading, under the conditions measured on site, on the
// revision that was rigged. Where the conditions cannot hold on that line, one sentence says why.

export type Prediction = { kind: "predicted"; tensionN: number } | { kind: "refused"; field: string; message: string };

interface RiggedLine {
  spanM: number;
  mainline: { mbsN: number };
}

export function predictReading(inputs: Record<string, unknown>, reading: ReadingBody, units: UnitSystem): Prediction {
  const line = inputs as unknown as RiggedLine;
  if (reading.measuredN >= line.mainline.mbsN) {
    return {
      kind: "refused",
      field: "measuredN",
      message: `Tension read: at or above the mainline's MBS (${capacityText(line.mainline.mbsN, units)}), the line would have failed; check the load cell's unit and reading.`,
    };
  }
  if (reading.kind === "walker" && !(reading.walkerPositionM < line.spanM)) {
    return { kind: "refused", field: "walkerPositionM", message: `Walker's distance from anchor A: less than the span, ${formatDistance(line.spanM, units)}.` };
  }
  if (reading.kind === "pretension" && !(reading.sagM < line.spanM / 2)) {
    return { kind: "refused", field: "sagM", message: `Sag measured at mid-span: less than half the span, ${formatDistance(line.spanM / 2, units)}.` };
  }
  try {
    const tensionN =
      reading.kind === "pretension"
        ? tensionForSag(inputs, reading.sagM, reading.anchor)
        : tensionWithWalker(inputs, reading.walkerMassKg, reading.walkerPositionM, reading.anchor);
    return { kind: "predicted", tensionN };
  } catch (error) {
    if (error instanceof RigInputError && error.field === "sagM") {
      return { kind: "refused", field: "sagM", message: "Sag measured at mid-span: this line cannot hang that flat below its MBS; measure the sag again." };
    }
    if (error instanceof RigInputError || error instanceof SolveError)
      return { kind: "refused", field: "form", message: `The engine cannot predict this reading: ${error.message}` };
    throw error;
  }
}

/** Measured against predicted, percent of the prediction. */
export const readingDifferencePercent = (measuredN: number, predictedN: number) => ((measuredN - predictedN) / predictedN) * 100;
