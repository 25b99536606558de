import type { Knex } from "knex";
import * as crewsAndPeople from "./20261201000001_crews_and_people";
import * as accountsAndInvitations from "./20261201000002_accounts_and_invitations";
import * as kit from "./20261201000010_kit";
import * as slipTests from "./20261201000011_slip_tests";
import * as uniqueItemLabels from "./20261201000012_unique_item_labels";
import * as sitesAndRigs from "./20261201000020_sites_and_rigs";
import * as crewMinimumClearance from "./20261202000030_crew_minimum_clearance";
import * as reviewAndSignOff from "./20261202000040_review_and_sign_off";
import * as emailChanges from "./20261202000050_email_changes";
import * as crewBoundKitKeys from "./20261202000060_crew_bound_kit_keys";

// Every migration, in order, imported statically so that the same list loads under tsx, Vitest
// and the Next.js server bundle alike. A unit test checks that no file of this folder is missing.
const migrations: Record<string, Knex.Migration> = {
  "20261201000001_crews_and_people.ts": crewsAndPeople,
  "20261201000002_accounts_and_invitations.ts": accountsAndInvitations,
  "20261201000010_kit.ts": kit,
  "20261201000011_slip_tests.ts": slipTests,
  "20261201000012_unique_item_labels.ts": uniqueItemLabels,
  "20261201000020_sites_and_rigs.ts": sitesAndRigs,
  "20261202000030_crew_minimum_clearance.ts": crewMinimumClearance,
  "20261202000040_review_and_sign_off.ts": reviewAndSignOff,
  "20261202000050_email_changes.ts": emailChanges,
  "20261202000060_crew_bound_kit_keys.ts": crewBoundKitKeys,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations),
  getMigrationName: (name) => name,
  getMigration: async (name) => migrations[name],
};
