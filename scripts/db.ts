// `npm run db:migrate`, `db:rollback [-- --all]`, `db:seed`: against DATABASE_URL when set, or
// against the local cluster, which this starts for the command and stops again afterwards.
import { openDatabase, seedIfEmpty } from "./services/migrate";
import { databaseUrl, ensureDatabase, startCluster, stopCluster, type PostgresCluster } from "./services/postgres";
import { projectDir, stackSettings } from "./services/stack";
import { StackError } from "./services/fail";

const commands = ["migrate", "rollback", "seed"] as const;
type Command = (typeof commands)[number];

async function run(command: Command, all: boolean): Promise<void> {
  let cluster: PostgresCluster | null = null;
  let url = process.env.DATABASE_URL;
  if (!url) {
    const settings = stackSettings("dev");
    cluster = await startCluster(projectDir, "dev", settings.pgPort);
    await ensureDatabase(cluster, settings.database);
    url = databaseUrl(cluster, settings.database);
  }
  const database = openDatabase(url);
  try {
    if (command === "migrate") {
      const [batch, names] = await database.migrate.latest();
      console.log(names.length ? `Applied batch ${batch}: ${names.join(", ")}` : "Already up to date.");
    } else if (command === "rollback") {
      const [batch, names] = await database.migrate.rollback(undefined, all);
      console.log(names.length ? `Rolled back${all ? " every batch" : ` batch ${batch}`}: ${names.join(", ")}` : "Nothing to roll back.");
    } else {
      const { seeded } = await seedIfEmpty(database);
      console.log(seeded ? "Seeded the demo crew." : "The database already has crews: the demo seed only goes into an empty database, so nothing was added.");
    }
  } finally {
    await database.destroy();
    if (cluster) stopCluster(cluster);
  }
}

const [command, ...flags] = process.argv.slice(2);
if (!commands.includes(command as Command)) {
  console.error(`spanwright: unknown database command "${command}"; use one of ${commands.join(", ")}.`);
  process.exit(2);
}
run(command as Command, flags.includes("--all")).catch((error) => {
  console.error(`spanwright: ${error instanceof StackError ? error.message : (error as Error).message}`);
  process.exit(1);
});
