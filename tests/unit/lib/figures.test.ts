import { capacityDigits, capacityText } from "@/physics";
import { describe, expect, it } from "vitest";
import { unit } from "mathjs";
import { efficiencyText, massPerLengthText, stretchTensionText, thresholdText } from "@/lib/figures";
import { specDigits, specText } from "@/components/kit/spec-summary";

// Reference conversions: mathjs units (a general-purpose library from the registry, on the NIST SP 811 definitions).
const lbf = (newtons: number) => unit(newtons, "N").toNumber("lbf");

describe("the Kit's and the Slip bench's figures in the crew's units", () => {
  it("cuts capacities down at the shown precision in both systems, never rounding up", () => {
    expect(capacityText(7400, "si")).toBe("7.40 kN");
    expect(capacityText(1150, "si")).toBe("1.15 kN");
    expect(capacityText(7400, "us")).toBe(`${Math.floor(lbf(7400))} lbf`);
    expect(capacityText(7400, "us")).toBe("1663 lbf");
    expect(capacityDigits(9000, "us")).toBe(String(Math.floor(lbf(9000))));
  });

  it("shows a stretch point's tension without conversion noise: kN as given, whole lbf", () => {
    expect(stretchTensionText(2, "si")).toBe("2 kN");
    expect(stretchTensionText(0.1 + 0.2, "si")).toBe("0.3 kN");
    // 2 kN = 449.618 lbf: the "449.618 lbf" now reads 450 lbf.
    expect(stretchTensionText(2, "us")).toBe(`${Math.round(lbf(2000))} lbf`);
    expect(stretchTensionText(2, "us")).toBe("450 lbf");
  });

  it("shows mass per length in g/m or oz/ft, efficiency in per cent", () => {
    expect(massPerLengthText(48, "si")).toBe("48 g/m");
    expect(massPerLengthText(48, "us")).toBe(`${unit(48, "g/m").toNumber("oz/ft").toFixed(2)} oz/ft`);
    expect(massPerLengthText(48, "us")).toBe("0.52 oz/ft");
    expect(efficiencyText(0.93)).toBe("93 %");
  });

  it("gives each spec its figure, and the box the same digits", () => {
    expect(specText("mbsKN", 32, "si")).toBe("32.00 kN");
    expect(specText("mbsKN", 32, "us")).toBe("7193 lbf");
    expect(specDigits("mbsKN", 32, "si")).toBe("32");
    expect(specDigits("mbsKN", 32, "us")).toBe("7193");
    expect(specText("widthMm", 25, "us")).toBe("25 mm");
    expect(specDigits("efficiency", 0.93, "us")).toBe("93");
  });

  it("shows the slip threshold, a setting, to the nearest step", () => {
    expect(thresholdText(200, "si")).toBe("0.20 kN");
    // 200 N = 44.96 lbf: nearest 45, where a capacity would be cut down to 44.
    expect(thresholdText(200, "us")).toBe("45 lbf");
  });
});
