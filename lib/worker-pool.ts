import "server-only";
import os from "node:os";
import { Worker } from "node:worker_threads";
import { RigInputError, SolveError } from "@/physics";
import { RequestError } from "./http-errors";
import type { TaskMessage, TaskName, TaskReply, TASKS, WireError } from "./worker-tasks";

// A small pool of worker threads for the heavy work of a request (lib/worker-tasks.ts). A request waits its
// turn in a short queue; past it the server answers 503 rather than letting the work pile up in memory.

const SIZE = Math.max(1, Math.min(2, os.availableParallelism()));
// Enough for every request of 20 busy connections to wait its turn; each waiting job holds at most one 1 MiB body.
const MAX_WAITING = 32;

interface Job {
  message: TaskMessage;
  transfer: ArrayBuffer[];
  resolve: (value: unknown) => void;
  reject: (error: Error) => void;
}

interface Slot {
  worker: Worker;
  job: Job | null;
}

/** The error the worker threw, rebuilt as the class the route handlers map to an answer; anything else stays a fault (500). */
function revive(error: WireError): Error {
  switch (error.name) {
    case "RigInputError":
      return Object.assign(new RigInputError(String(error.field), undefined, String(error.allowed)), { given: error.given, message: error.message });
    case "SolveError":
      return Object.assign(new SolveError("", Number(error.iterations), Number(error.residual)), { message: error.message });
    case "RequestError":
      return new RequestError(
        error.status as RequestError["status"],
        error.message,
        error.fieldErrors as Record<string, string>,
        error.headers as Record<string, string>,
      );
    default:
      return new Error(`${error.name} in a worker thread: ${error.message}`);
  }
}

class WorkerPool {
  private readonly slots: Slot[] = [];
  private readonly waiting: Job[] = [];

  run(message: TaskMessage, transfer: ArrayBuffer[]): Promise<unknown> {
    return new Promise((resolve, reject) => {
      const job = { message, transfer, resolve, reject };
      const free = this.slots.find((s) => !s.job) ?? (this.slots.length < SIZE ? this.spawn() : null);
      if (free) return this.start(free, job);
      if (this.waiting.length >= MAX_WAITING) {
        return reject(new RequestError(503, "The server is busy with other checks: try again in a few seconds.", {}, { "Retry-After": "5" }));
      }
      this.waiting.push(job);
    });
  }

  private spawn(): Slot {
    const worker = new Worker(new URL("./worker-tasks.ts", import.meta.url));
    worker.unref();
    const slot: Slot = { worker, job: null };
    worker.on("message", (reply: TaskReply) => {
      const job = slot.job!;
      this.finish(slot);
      if (reply.ok) job.resolve(reply.result);
      else job.reject(revive(reply.error));
    });
    // A worker that dies takes its job with it; the next job gets a fresh one.
    worker.on("error", (error) => this.lose(slot, error));
    worker.on("exit", (code) => this.lose(slot, new Error(`a worker thread stopped with code ${code}`)));
    this.slots.push(slot);
    return slot;
  }

  private start(slot: Slot, job: Job): void {
    slot.job = job;
    slot.worker.postMessage(job.message, job.transfer);
  }

  private finish(slot: Slot): void {
    slot.job = null;
    const next = this.waiting.shift();
    if (next) this.start(slot, next);
  }

  private lose(slot: Slot, error: Error): void {
    const index = this.slots.indexOf(slot);
    if (index < 0) return;
    this.slots.splice(index, 1);
    slot.job?.reject(error);
    void slot.worker.terminate();
    const next = this.waiting.shift();
    if (next) this.start(this.spawn(), next);
  }
}

const globalForPool = globalThis as unknown as { spanwrightWorkers?: WorkerPool };
const pool = () => (globalForPool.spanwrightWorkers ??= new WorkerPool());

type Task = typeof TASKS;

/** Runs one task of lib/worker-tasks.ts on a worker thread; `transfer` hands large buffers over instead of copying them. */
export async function offThread<T extends TaskName>(
  task: T,
  payload: Parameters<Task[T]>[0],
  transfer: ArrayBuffer[] = [],
): Promise<ReturnType<Task[T]>["result"]> {
  return (await pool().run({ task, payload }, transfer)) as ReturnType<Task[T]>["result"];
}
