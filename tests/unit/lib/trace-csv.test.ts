import { describe, expect, it } from "vitest";
import { parseTraceCsv } from "@/lib/trace-csv";
import { RequestError } from "@/lib/http-errors";

// NIST SP 811 (2008), appendix B: 1 lbf = 4.448 221 615 260 5 N; 1 kgf = 9.806 65 N.
const LBF = 4.4482216152605;
const KGF = 9.80665;

function refusal(text: string, unit: "N" | "kN" | "lbf" | "kgf" = "N"): string {
  try {
    parseTraceCsv(text, unit);
  } catch (error) {
    expect(error).toBeInstanceOf(RequestError);
    expect((error as RequestError).status).toBe(422);
    return (error as Error).message;
  }
  throw new Error("the trace was accepted");
}

describe("parseTraceCsv", () => {
  it("reads a headed comma-separated trace in kN into seconds and newtons", () => {
    const trace = parseTraceCsv("time_s,force_kN\n0,0\n0.5,1.25\n1,2.5\n", "kN");
    expect(Array.from(trace.time)).toEqual([0, 0.5, 1]);
    expect(Array.from(trace.force)).toEqual([0, 1250, 2500]);
    expect(trace.header).toEqual(["time_s", "force_kN"]);
    expect(trace.forceColumn).toBe("force_kN");
  });

  it("reads semicolons with decimal commas, a byte-order mark and a blank line", () => {
    const trace = parseTraceCsv("\ufeffZeit;Kraft\n0,0;10,5\n\n0,1;20,25\n", "N");
    expect(Array.from(trace.time)).toEqual([0, 0.1]);
    expect(Array.from(trace.force)).toEqual([10.5, 20.25]);
    expect(trace.delimiter).toBe("semicolon");
    expect(trace.decimalComma).toBe(true);
  });

  it("reads tab-separated rows without a header as time then force, and converts lbf and kgf by their NIST definitions", () => {
    expect(Array.from(parseTraceCsv("0\t100\n1\t200\n", "lbf").force)).toEqual([100 * LBF, 200 * LBF]);
    expect(Array.from(parseTraceCsv("0\t100\n1\t200\n", "kgf").force)).toEqual([100 * KGF, 200 * KGF]);
  });

  it("finds the force column by its header, wherever it stands, and reads milliseconds", () => {
    const trace = parseTraceCsv("sample,time (ms),temperature,load (N)\n1,0,20,5\n2,250,20,9\n", "N");
    expect(Array.from(trace.time)).toEqual([0, 0.25]);
    expect(Array.from(trace.force)).toEqual([5, 9]);
  });

  it("says which row does not parse and why", () => {
    expect(refusal("t,F\n0,1\n1,2\n2,x7\n")).toBe('Row 4: the force "x7" is not a number.');
    expect(refusal("t,F\n0,1\n1\n")).toMatch(/^Row 3 has 1 field; expected at least 2/);
  });

  it("refuses times that go backwards or repeat", () => {
    expect(refusal("t,F\n0,1\n1,2\n0.5,3\n")).toMatch(/^Row 4: the time 0.5 is not after the previous row's/);
    expect(refusal("0,1\n0,2\n")).toMatch(/^Row 2/);
  });

  it("refuses a file with no numeric force column", () => {
    expect(refusal("time,comment\n0,start\n1,pulling\n")).toMatch(/no numeric force column/);
    expect(refusal("time\n0\n1\n")).toBe('The header "time" has only a time column: a trace needs a force column beside it.');
  });

  it("tells a trace without a time column that the time is missing, not the force", () => {
    expect(refusal("force (N)\n0\n10\n")).toBe('The header "force (N)" has only a force column: a trace needs a time column (in seconds) beside it.');
    expect(refusal("reading\n0\n10\n")).toBe('The header "reading" has only one column: a trace needs a time column (in seconds) and a force column.');
    expect(refusal("0\n10\n")).toBe("Row 1 has 1 field; expected at least 2 (time and force) separated by commas.");
  });

  it("refuses a force unit that contradicts the header", () => {
    expect(refusal("time,force (kN)\n0,1\n1,2\n", "N")).toMatch(/headed "force \(kN\)" \(kN\) but you chose N/);
  });

  it("refuses a trace of fewer than two samples", () => {
    expect(refusal("time,force\n0,1\n")).toMatch(/fewer than two rows/);
  });
});
