import { StackError } from "./fail";
import { commandExists, isRoot, runLive } from "./process";

let updated = false;

/** Installs Debian packages with apt-get; a StackError when that cannot be done here. */
export async function aptInstall(packages: string[], why: string): Promise<void> {
  if (!commandExists("apt-get")) {
    throw new StackError(
      `${why} needs the Debian packages ${packages.join(", ")}, and this machine has no apt-get: install them with the system's package manager, then run the command again.`,
    );
  }
  if (!isRoot()) {
    throw new StackError(
      `${why} needs the Debian packages ${packages.join(", ")}: run \`sudo apt-get install -y ${packages.join(" ")}\`, then run the command again.`,
    );
  }
  console.log(`spanwright: installing ${packages.join(", ")} from Debian's packages (${why})`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  if (!updated) {
    if ((await runLive("apt-get", ["update"], { env })) !== 0) {
      throw new StackError("`apt-get update` failed: check the connection to Debian's package mirror, then run the command again.");
    }
    updated = true;
  }
  if ((await runLive("apt-get", ["install", "-y", "--no-install-recommends", ...packages], { env })) !== 0) {
    throw new StackError(`\`apt-get install ${packages.join(" ")}\` failed (see above): fix what apt reports, then run the command again.`);
  }
}
