import Papa from "papaparse";
import { toNewtons, type ForceUnit } from "@/physics";
import { RequestError } from "./http-errors";

// Load-cell traces as CSV: time and force columns, with or without a header, separated by commas,
// semicolons or tabs; with a semicolon or tab separator, decimal commas are read as decimal points.

export interface ParsedTrace {
  /** Seconds, strictly increasing. */
  time: Float64Array;
  /** Newtons. */
  force: Float64Array;
  header: string[] | null;
  timeColumn: string;
  forceColumn: string;
  delimiter: string;
  decimalComma: boolean;
}

const traceError = (message: string) => new RequestError(422, message);

const DELIMITER_NAMES: Record<string, string> = { ",": "comma", ";": "semicolon", "\t": "tab" };

/** The separator: a tab or semicolon on every one of the first lines wins over the comma. */
function detectDelimiter(text: string): string {
  const lines = text
    .slice(0, 16 * 1024)
    .split(/\r?\n/)
    .filter((l) => l.trim() !== "")
    .slice(0, 20);
  if (lines.length > 0 && lines.every((l) => l.includes("\t"))) return "\t";
  if (lines.length > 0 && lines.every((l) => l.includes(";"))) return ";";
  return ",";
}

const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

function numberOf(field: string, decimalComma: boolean): number {
  const text = decimalComma ? field.trim().replace(",", ".") : field.trim();
  return NUMBER.test(text) ? Number(text) : NaN;
}

const TIME_HEADER = /time|zeit|^t\b|^s$|sec/i;
const FORCE_HEADER = /force|load|kraft|tension|\bkn\b|\blbf\b|\bkgf\b|^n$|\(n\)|\[n\]/i;
const MILLISECONDS = /\bms\b|\(ms\)|\[ms\]|_ms\b|millis/i;
// A unit written in the force column's header, to catch a unit chosen wrongly.
const HEADER_UNIT = /(?:\(|\[|_|\s|^)(kN|N|lbf|kgf)(?:\)|\]|$)/;

interface Columns {
  time: number;
  force: number;
  timeScale: number;
}

/**
 * The time and force columns a header names. A column headed like a time (time, t, s, sec…) is the time and
 * one headed like a force (force, load, kN, lbf…) the force; failing a name, the first other column stands in.
 */
function columnsFromHeader(header: string[], unit: ForceUnit): Columns {
  const shown = header.map((h) => `"${h}"`).join(", ");
  if (header.length < 2) {
    const only = TIME_HEADER.test(header[0])
      ? "only a time column: a trace needs a force column beside it"
      : FORCE_HEADER.test(header[0])
        ? "only a force column: a trace needs a time column (in seconds) beside it"
        : "only one column: a trace needs a time column (in seconds) and a force column";
    throw traceError(`The header ${shown} has ${only}.`);
  }
  const namedTime = header.findIndex((h) => TIME_HEADER.test(h));
  const namedForce = header.findIndex((h, i) => i !== namedTime && FORCE_HEADER.test(h));
  const forceIndex = namedForce >= 0 ? namedForce : header.findIndex((_, i) => i !== Math.max(namedTime, 0));
  const time = namedTime >= 0 ? namedTime : header.findIndex((_, i) => i !== forceIndex);
  const written = HEADER_UNIT.exec(header[forceIndex].trim())?.[1];
  if (written && written !== unit) {
    throw traceError(
      `The force column is headed "${header[forceIndex].trim()}" (${written}) but you chose ${unit}: choose the unit the load cell recorded in.`,
    );
  }
  return { time, force: forceIndex, timeScale: MILLISECONDS.test(header[time]) ? 1e-3 : 1 };
}

/** Grows a Float64Array by doubling, so a million rows cost a few copies rather than a million pushes. */
class Column {
  values = new Float64Array(4096);
  length = 0;
  push(v: number) {
    if (this.length === this.values.length) {
      const grown = new Float64Array(this.values.length * 2);
      grown.set(this.values);
      this.values = grown;
    }
    this.values[this.length++] = v;
  }
  done() {
    return this.values.subarray(0, this.length);
  }
}

/**
 * Parses a trace. The first row is a header when its first two fields are not both numbers. Without a
 * header the first column is time (s) and the second force. Any row that does not parse, and any time
 * that does not increase, stops the parse with the row's line number and the reason.
 */
export function parseTraceCsv(source: string, unit: ForceUnit): ParsedTrace {
  const text = source.charCodeAt(0) === 0xfeff ? source.slice(1) : source;
  const delimiter = detectDelimiter(text);
  const decimalComma = delimiter !== ",";
  const time = new Column();
  const force = new Column();
  let header: string[] | null = null;
  let columns: Columns | null = null;
  let line = 0;
  let problem: string | null = null;
  let previousTime = -Infinity;

  Papa.parse<string[]>(text, {
    delimiter,
    skipEmptyLines: false,
    step: (step, parser) => {
      line++;
      const row = step.data;
      if (row.length === 1 && row[0].trim() === "") return;
      if (!columns) {
        // A first row of numbers is data (a lone number too: the row check below then says a field is missing).
        const looksNumeric = !Number.isNaN(numberOf(row[0], decimalComma)) && (row.length < 2 || !Number.isNaN(numberOf(row[1], decimalComma)));
        if (!looksNumeric) {
          header = row.map((h) => h.trim());
          columns = columnsFromHeader(header, unit);
          return;
        }
        columns = { time: 0, force: 1, timeScale: 1 };
      }
      const needed = Math.max(columns.time, columns.force) + 1;
      if (row.length < needed) {
        problem = `Row ${line} has ${row.length} field${row.length === 1 ? "" : "s"}; expected at least ${needed} (time and force) separated by ${DELIMITER_NAMES[delimiter]}s.`;
        return parser.abort();
      }
      const t = numberOf(row[columns.time], decimalComma) * columns.timeScale;
      const f = numberOf(row[columns.force], decimalComma);
      if (!Number.isFinite(t)) problem = `Row ${line}: the time "${row[columns.time]}" is not a number.`;
      else if (!Number.isFinite(f) && time.length === 0) {
        problem = `The trace has no numeric force column: row ${line} holds "${row[columns.force]}" where the force should be.`;
      } else if (!Number.isFinite(f)) problem = `Row ${line}: the force "${row[columns.force]}" is not a number.`;
      else if (!(t > previousTime))
        problem = `Row ${line}: the time ${row[columns.time].trim()} is not after the previous row's; times must increase from row to row.`;
      if (problem) return parser.abort();
      previousTime = t;
      time.push(t);
      force.push(toNewtons(f, unit));
    },
  });

  if (problem) throw traceError(problem);
  if (time.length < 2)
    throw traceError("The trace has fewer than two rows of numbers: a trace needs a time column and a force column with at least two samples.");
  const finalColumns = columns as Columns | null;
  const finalHeader = header as string[] | null;
  return {
    time: time.done(),
    force: force.done(),
    header: finalHeader,
    timeColumn: finalHeader ? finalHeader[finalColumns!.time] : "column 1",
    forceColumn: finalHeader ? finalHeader[finalColumns!.force] : "column 2",
    delimiter: DELIMITER_NAMES[delimiter],
    decimalComma,
  };
}
