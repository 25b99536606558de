import { spawn, spawnSync, type SpawnOptions } from "node:child_process";

export interface RunResult {
  status: number;
  stdout: string;
  stderr: string;
}

/** Runs a command to completion, capturing its output. */
export function runCaptured(command: string, args: string[], options: SpawnOptions = {}): RunResult {
  const result = spawnSync(command, args, { encoding: "utf8", ...options, stdio: ["ignore", "pipe", "pipe"] });
  return {
    status: result.status ?? (result.error ? 127 : 1),
    stdout: String(result.stdout ?? ""),
    stderr: String(result.stderr ?? result.error?.message ?? ""),
  };
}

/** Runs a command with its output shown live; resolves with its exit code. */
export function runLive(command: string, args: string[], options: SpawnOptions = {}): Promise<number> {
  return new Promise((resolve) => {
    const child = spawn(command, args, { stdio: "inherit", ...options });
    child.on("error", () => resolve(127));
    child.on("exit", (code, signal) => resolve(code ?? (signal ? 128 : 1)));
  });
}

export function isRoot(): boolean {
  return typeof process.getuid === "function" && process.getuid() === 0;
}

export function commandExists(command: string): boolean {
  return runCaptured("sh", ["-c", `command -v ${command}`]).status === 0;
}
