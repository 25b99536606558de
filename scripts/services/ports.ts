import net from "node:net";
import { StackError } from "./fail";
import type { Profile } from "./stack";

/** The variable that sets a port: `PORT`, `PG_PORT`… for development, `TEST_PORT`, `TEST_PG_PORT`… for the tests. */
export function portVariable(profile: Profile, name: "PORT" | "PG_PORT" | "S3_PORT" | "SMTP_PORT"): string {
  return profile === "dev" ? name : `TEST_${name}`;
}

/** Resolves when nothing listens on 127.0.0.1:port; otherwise a StackError naming the port. */
export async function assertPortFree(port: number, what: string, envName: string): Promise<void> {
  const free = await new Promise<boolean>((resolve) => {
    const probe = net.createServer();
    probe.once("error", () => resolve(false));
    probe.once("listening", () => probe.close(() => resolve(true)));
    probe.listen(port, "127.0.0.1");
  });
  if (!free) {
    throw new StackError(
      `Port ${port} on 127.0.0.1, needed for ${what}, is already taken: stop whatever uses it (\`ss -ltnp 'sport = :${port}'\` shows it) or set ${envName} to another port.`,
    );
  }
}
