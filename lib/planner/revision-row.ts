import { evaluateRig, RigInputError, type RigResult } from "@/physics";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { prepareRigInput, type KitCatalogue, type RevisionSnapshot, type SiteSnapshot } from "./kit";
import { gearRefusal, rigInputRefusal } from "./problems";

/** A revision as the planner's save makes it: the prepared input, the server's result and what it was built from. */
export interface NewRevision {
  name: string;
  siteId: string | null;
  inputs: Record<string, unknown>;
  snapshot: RevisionSnapshot;
  result: RigResult;
  engineVersion: string;
  spanM: number;
  mainlineName: string;
}

/** The rig_revisions row of a new revision (its number and base are the caller's). */
export function revisionRow(crewId: string, rigId: string, authorId: string, revision: NewRevision) {
  return {
    crew_id: crewId,
    rig_id: rigId,
    inputs: JSON.stringify(revision.inputs),
    snapshot: JSON.stringify(revision.snapshot),
    result: JSON.stringify(revision.result),
    engine_version: revision.engineVersion,
    span_m: revision.spanM,
    mainline_name: revision.mainlineName,
    author_id: authorId,
  };
}

/**
 * A revision from the planner's values: the Kit and the site fill the inputs exactly as the browser did,
 * and the engine evaluates them. What the Kit or the engine refuses throws a 400 naming the field in the
 * form's words and the crew's units.
 */
export function buildRevision(
  body: { name: string; siteId: string | null; inputs: Record<string, unknown> },
  catalogue: KitCatalogue,
  site: SiteSnapshot | null,
  units: UnitSystem,
): NewRevision {
  const prepared = prepareRigInput({ ...body.inputs, name: body.name }, catalogue, site);
  if (prepared.problems.length) throw gearRefusal(prepared.problems);
  let result: RigResult;
  try {
    result = evaluateRig(prepared.input);
  } catch (error) {
    if (error instanceof RigInputError) throw rigInputRefusal(error, units);
    throw error;
  }
  return {
    name: body.name,
    siteId: body.siteId,
    inputs: prepared.input,
    snapshot: prepared.snapshot,
    result,
    engineVersion: result.engineVersion,
    spanM: Number(prepared.input.spanM),
    mainlineName: String((prepared.input.mainline as { name: unknown }).name),
  };
}
