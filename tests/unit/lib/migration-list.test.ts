import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { migrationSource } from "@/migrations";
import { seedSource } from "@/seeds";

const listed = (dir: string) =>
  fs
    .readdirSync(path.join(process.cwd(), dir))
    .filter((f) => f.endsWith(".ts") && f !== "index.ts")
    .sort();

describe("the static migration and seed lists", () => {
  it("name every migration file, in file-name order", async () => {
    expect(await migrationSource.getMigrations([])).toEqual(listed("migrations"));
  });
  it("name every seed file, in file-name order", async () => {
    expect(await seedSource.getSeeds({})).toEqual(listed("seeds"));
  });
});
