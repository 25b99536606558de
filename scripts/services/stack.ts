import path from "node:path";
import { assertPortFree, portVariable } from "./ports";
import { StackError } from "./fail";
import { databaseUrl, ensureDatabase, startCluster, stopCluster, type PostgresCluster } from "./postgres";
import { startS3Fake, type S3Fake } from "./s3-fake";
import { startSmtpFake, type SmtpFake } from "./smtp-fake";
import { migrateAndSeed } from "./migrate";

export type Profile = "dev" | "test";

export interface StackSettings {
  profile: Profile;
  appPort: number;
  pgPort: number;
  s3Port: number;
  smtpPort: number;
  database: string;
  dataDir: string;
}

export const projectDir = path.resolve(__dirname, "..", "..");

function portFromEnv(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1024 || port > 65535) {
    throw new StackError(`${name}=${raw} is not a usable port: give a whole number from 1024 to 65535.`);
  }
  return port;
}

/** Ports and folders of each profile: the test profile never touches the development data. */
export function stackSettings(profile: Profile): StackSettings {
  const dev = profile === "dev";
  return {
    profile,
    appPort: portFromEnv(portVariable(profile, "PORT"), dev ? 3000 : 3100),
    pgPort: portFromEnv(portVariable(profile, "PG_PORT"), dev ? 5491 : 5492),
    s3Port: portFromEnv(portVariable(profile, "S3_PORT"), dev ? 4591 : 4592),
    smtpPort: portFromEnv(portVariable(profile, "SMTP_PORT"), dev ? 2591 : 2592),
    database: dev ? "spanwright" : "spanwright_test",
    dataDir: path.join(projectDir, ".data", profile),
  };
}

export interface RunningStack {
  settings: StackSettings;
  /** The environment the app and the tests run with. */
  env: Record<string, string>;
  stop(): Promise<void>;
}

const BUCKET = "spanwright-uploads";
const wait = (ms: number) => new Promise<void>((resolve) => setTimeout(resolve, ms).unref());

/**
 * Starts PostgreSQL, the S3 fake and the SMTP fake, migrates and seeds. On any failure, stops
 * whatever it had already started before passing the error on.
 */
export async function startStack(profile: Profile): Promise<RunningStack> {
  const settings = stackSettings(profile);
  await assertPortFree(settings.appPort, "the web app", portVariable(profile, "PORT"));
  await assertPortFree(settings.s3Port, "the local S3 fake", portVariable(profile, "S3_PORT"));
  await assertPortFree(settings.smtpPort, "the local SMTP fake", portVariable(profile, "SMTP_PORT"));

  let cluster: PostgresCluster | null = null;
  let s3: S3Fake | null = null;
  let smtp: SmtpFake | null = null;
  // The fakes get a few seconds to close (connections kept alive under load could hold them open for good);
  // the database is stopped whatever they do, and again from the exit handler should the process end first.
  const stop = async () => {
    try {
      await Promise.all([smtp?.close(), s3?.close()].map((closing) => Promise.race([closing?.catch(() => undefined), wait(3000)])));
    } finally {
      if (cluster) stopCluster(cluster);
    }
  };
  process.once("exit", () => {
    if (cluster) stopCluster(cluster);
  });

  try {
    // The ports above are free, so no other run of this checkout is up: a cluster still running was left behind.
    cluster = await startCluster(projectDir, profile, settings.pgPort, "stop");
    await ensureDatabase(cluster, settings.database, profile === "test");
    const url = databaseUrl(cluster, settings.database);
    const mailDir = path.join(settings.dataDir, "mail");
    s3 = await startS3Fake(settings.s3Port, path.join(settings.dataDir, "s3"), BUCKET);
    smtp = await startSmtpFake(settings.smtpPort, mailDir);
    const env: Record<string, string> = {
      NODE_ENV: "production",
      NEXT_TELEMETRY_DISABLED: "1",
      DATABASE_URL: url,
      APP_ORIGIN: `http://127.0.0.1:${settings.appPort}`,
      S3_ENDPOINT: s3.endpoint,
      S3_BUCKET: BUCKET,
      S3_REGION: "us-east-1",
      S3_ACCESS_KEY_ID: "S3RVER",
      S3_SECRET_ACCESS_KEY: "S3RVER",
      S3_FORCE_PATH_STYLE: "true",
      SMTP_URL: `smtp://127.0.0.1:${settings.smtpPort}`,
      MAIL_FROM: "Spanwright <no-reply@spanwright.local>",
      DEV_MAILBOX_DIR: mailDir,
      COOKIE_SECURE: "false",
      // The suites stand in for a proxy on loopback, naming each client's address in X-Forwarded-For; the fault
      // suite stops and starts the cluster in PG_DATA_DIR in the middle of a load run.
      ...(profile === "test" ? { TRUSTED_PROXIES: "127.0.0.1", PG_DATA_DIR: cluster.dataDir } : {}),
    };
    // The demo seed stores its traces' bytes in the bucket, so it runs with the fakes' settings.
    for (const [name, value] of Object.entries(env)) if (name.startsWith("S3_")) process.env[name] = value;
    await migrateAndSeed(url);
    return { settings, env, stop };
  } catch (error) {
    await stop();
    throw error;
  }
}
