import type { Knex } from "knex";
import * as demoCrew from "./01_demo_crew";
import * as demoKitAndSlipBench from "./02_demo_kit_and_slip_bench";
import * as demoSitesAndRigs from "./03_demo_sites_and_rigs";
import * as demoReviewAndSiteDay from "./04_demo_review_and_site_day";

// The demo seeds, in order, imported statically for the same reason as the migration list.
const seeds: Record<string, Knex.Seed> = {
  "01_demo_crew.ts": demoCrew,
  "02_demo_kit_and_slip_bench.ts": demoKitAndSlipBench,
  "03_demo_sites_and_rigs.ts": demoSitesAndRigs,
  "04_demo_review_and_site_day.ts": demoReviewAndSiteDay,
};

export const seedSource: Knex.SeedSource<string> = {
  getSeeds: async () => Object.keys(seeds),
  getSeed: async (name) => seeds[name],
};
