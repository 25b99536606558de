// `npm start`: sets up and runs the whole product on this machine; Ctrl-C stops all it started.
// `npm run dev` (`start --dev`): the same stack (PostgreSQL, the S3 and SMTP fakes, migrations, the demo seed
// into an empty database) with `next dev`, which reloads as files change, instead of a production build.
import { startStack, type RunningStack } from "./services/stack";
import { buildApp, serveApp, type AppServer } from "./services/app-server";
import { StackError } from "./services/fail";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "../seeds/01_demo_crew";

let stack: RunningStack | null = null;
let server: AppServer | null = null;
let stopping = false;

// Ctrl-C reaches this process more than once (from the terminal and again from npm and tsx, which pass it on):
// only the first starts the shutdown, and the process exits once everything it started has stopped. Each
// step runs whatever the one before did; the database stops last, and from the exit handler if need be.
async function shutdown(code: number): Promise<void> {
  if (stopping) return;
  stopping = true;
  try {
    await server?.stop();
  } catch (error) {
    console.error("spanwright: the web server did not stop cleanly:", error);
  } finally {
    await stack?.stop();
  }
  console.log("spanwright: stopped.");
  process.exit(code);
}

process.on("SIGINT", () => void shutdown(0));
process.on("SIGTERM", () => void shutdown(0));

const development = process.argv.includes("--dev");

async function main() {
  stack = await startStack("dev");
  if (development) {
    // next dev needs the development mode, not the production one the stack sets for `next start`.
    server = await serveApp({ ...stack.env, NODE_ENV: "development" }, stack.settings.appPort, "dev");
  } else {
    await buildApp(stack.env);
    server = await serveApp(stack.env, stack.settings.appPort);
  }
  console.log(`
Spanwright${development ? " (development server, reloads as you edit)" : ""} is running at ${server.url}
  PostgreSQL 127.0.0.1:${stack.settings.pgPort} (database ${stack.settings.database}), S3 fake 127.0.0.1:${stack.settings.s3Port}, SMTP fake 127.0.0.1:${stack.settings.smtpPort}
  Demo sign-in (password ${DEMO_PASSWORD}):
${DEMO_PEOPLE.map((p) => `    ${p.role.padEnd(7)} ${p.email}`).join("\n")}
Press Ctrl-C to stop.`);
}

main().catch(async (error) => {
  console.error(`spanwright: ${error instanceof StackError ? error.message : (error as Error).stack}`);
  await shutdown(1);
});
