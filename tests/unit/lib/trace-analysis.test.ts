import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { analyseTrace, decimate } from "@/lib/trace-analysis";
import { parseTraceCsv } from "@/lib/trace-csv";
import { RequestError } from "@/lib/http-errors";

describe("decimate", () => {
  // Independent check by brute force: the chart keeps the trace's extremes, the onset sample and time order.
  it("keeps the highest and lowest sample, the onset, and time order, within the point budget", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e4, max: 1e4, noNaN: true }), { minLength: 2, maxLength: 3000 }), fc.nat(), (force, pick) => {
        const time = force.map((_, i) => i * 0.01);
        const keep = pick % force.length;
        const chart = decimate(time, force, 200, keep);
        expect(chart.time.length).toBeLessThanOrEqual(201);
        expect(Math.max(...chart.force)).toBe(Math.max(...force));
        expect(Math.min(...chart.force)).toBe(Math.min(...force));
        expect(chart.time).toContain(time[keep]);
        for (let i = 1; i < chart.time.length; i++) expect(chart.time[i]).toBeGreaterThan(chart.time[i - 1]);
      }),
    );
  });
});

describe("analyseTrace", () => {
  it("reports a slow pull that never drops as held to its maximum, a lower bound", () => {
    const csv = ["t,F", ...Array.from({ length: 50 }, (_, i) => `${i},${1000 + i * 20}`)].join("\n");
    const analysis = analyseTrace(parseTraceCsv(csv, "N"), "N", 200);
    expect(analysis.onset).toMatchObject({ kind: "held", forceN: 1980, timeS: 49 });
    expect(analysis.rows).toBe(50);
  });

  it("refuses a trace whose peak no slip bench reaches in the chosen unit", () => {
    const csv = "t,F\n0,1\n1,2\n";
    expect(() => analyseTrace(parseTraceCsv(csv, "N"), "N", 200)).toThrow(RequestError);
    expect(() => analyseTrace(parseTraceCsv(csv, "N"), "N", 200)).toThrow(/peaks at 2 N, outside what a slip bench measures \(100–50000 N\): check the unit/);
  });
});

describe("analyseTrace with the time the pull ended", () => {
  // A pull to 3 kN that held, then the release to zero (the shape of every held test that records its release).
  const csv = ["t,F", ...Array.from({ length: 31 }, (_, i) => `${i},${i * 100}`), "31,1500", "32,0", "33,0"].join("\n");

  it("takes the release for a slip when no end is given, as the definition of a drop says", () => {
    expect(analyseTrace(parseTraceCsv(csv, "N"), "N", 200).onset).toMatchObject({ kind: "slipped", forceN: 3000 });
  });

  it("reports held to the maximum when the tester says when the pull ended", () => {
    const analysis = analyseTrace(parseTraceCsv(csv, "N"), "N", 200, 30);
    expect(analysis.onset).toMatchObject({ kind: "held", forceN: 3000, timeS: 30 });
    expect(analysis.pullEndS).toBe(30);
  });
});
