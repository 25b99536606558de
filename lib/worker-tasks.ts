import { parentPort } from "node:worker_threads";
import { evaluateRig, type DisplayUnits, type ForceUnit } from "@/physics";
import { parseJsonBytes } from "./request-body";
import { sha256Hex } from "./sha256";
import { analyseTrace } from "./trace-analysis";
import { parseTraceCsv } from "./trace-csv";
import { traceText } from "./uploads";

// The heavy work of a request, run on a worker thread (lib/worker-pool.ts) so that the server's event loop
// stays free to answer everyone else while one rig is checked or one trace is read.

export interface TraceJob {
  fileName: string;
  bytes: Uint8Array;
  unit: ForceUnit;
  dropN: number;
  pullEndS?: number;
}

export const TASKS = {
  /**
   * The request body's JSON parsed and checked here, the rig evaluated, its sentences in the crew's units (the figures
   * are SI whatever the units), as the UTF-8 bytes of its JSON. Bytes cross the thread both ways without a copy
   * (a result of some 25 kB is ready to send), so the server's thread neither parses the rig nor copies it object by
   * object, nor writes the result out again.
   */
  evaluateRigJson: (job: { body: Uint8Array; units: DisplayUnits }) => {
    const bytes = new TextEncoder().encode(JSON.stringify(evaluateRig(parseJsonBytes(job.body), { units: job.units })));
    return { result: bytes, transfer: [bytes.buffer] };
  },
  /** Type check, hash, parse and slip detection of an uploaded trace; the bytes go back to the caller for storing. */
  analyseTrace: (job: TraceJob) => {
    const { contentType, text } = traceText(job.fileName, job.bytes);
    const analysis = analyseTrace(parseTraceCsv(text, job.unit), job.unit, job.dropN, job.pullEndS);
    return { result: { contentType, analysis, sha256: sha256Hex(job.bytes), bytes: job.bytes }, transfer: [job.bytes.buffer as ArrayBuffer] };
  },
};

export type TaskName = keyof typeof TASKS;

export interface TaskMessage {
  task: TaskName;
  payload: unknown;
}

/** An error as it crosses the thread: its name, message and own fields (the field of a RigInputError, the status of a RequestError). */
export type WireError = { name: string; message: string } & Record<string, unknown>;

export type TaskReply = { ok: true; result: unknown } | { ok: false; error: WireError };

parentPort?.on("message", ({ task, payload }: TaskMessage) => {
  try {
    const { result, transfer } = (TASKS[task] as (payload: unknown) => { result: unknown; transfer?: ArrayBuffer[] })(payload);
    parentPort!.postMessage({ ok: true, result } satisfies TaskReply, transfer ?? []);
  } catch (thrown) {
    const error = thrown instanceof Error ? thrown : new Error(String(thrown));
    parentPort!.postMessage({ ok: false, error: { ...error, name: error.name, message: error.message } } satisfies TaskReply);
  }
});
