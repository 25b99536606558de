import { spawn, type ChildProcess } from "node:child_process";
import path from "node:path";
import { StackError } from "./fail";
import { runLive } from "./process";
import { projectDir } from "./stack";

const nextBin = path.join(projectDir, "node_modules", ".bin", "next");

export async function buildApp(env: Record<string, string>): Promise<void> {
  const code = await runLive(nextBin, ["build"], { cwd: projectDir, env: { ...process.env, ...env } });
  if (code !== 0) throw new StackError("The production build failed (see the errors above): fix them, then run the command again.");
}

export interface AppServer {
  url: string;
  stop(): Promise<void>;
}

/**
 * Serves the app on 127.0.0.1 and waits until /api/health answers: the production build (`next start`), or
 * the development server (`next dev`, which compiles each page on its first request).
 */
export async function serveApp(env: Record<string, string>, port: number, mode: "start" | "dev" = "start"): Promise<AppServer> {
  const child: ChildProcess = spawn(nextBin, [mode, "-H", "127.0.0.1", "-p", String(port)], {
    cwd: projectDir,
    env: { ...process.env, ...env },
    stdio: ["ignore", "inherit", "inherit"],
  });
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  const stop = async () => {
    if (child.exitCode === null && child.signalCode === null) child.kill("SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 5000))]);
    if (child.exitCode === null && child.signalCode === null) child.kill("SIGKILL");
  };
  const url = `http://127.0.0.1:${port}`;
  const seconds = mode === "dev" ? 180 : 60;
  const deadline = Date.now() + seconds * 1000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new StackError(`The web server exited at start (code ${child.exitCode}); see its output above.`);
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.ok) return { url, stop };
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  await stop();
  throw new StackError(`The web server did not answer ${url}/api/health within ${seconds} s; see its output above.`);
}
