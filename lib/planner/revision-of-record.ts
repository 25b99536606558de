import { evaluateRig, RigInputError } from "@/physics";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { RequestError } from "@/lib/http-errors";
import type { NewRevision } from "@/db/rigs";
import { kitCatalogue, siteSnapshot } from "./catalogue";
import { prepareRigInput } from "./kit";
import { gearRefusal, rigInputRefusal } from "./problems";

/**
 * The server's revision for a planner's save: the crew's Kit and site fill the inputs exactly as the
 * browser did, the engine evaluates them again, and inputs, result and snapshot are kept together.
 * Anything the Kit or the engine refuses answers 400 naming the field in the form's words and the crew's units.
 */
export async function revisionOfRecord(
  crewId: string,
  units: UnitSystem,
  body: { name: string; siteId: string | null; inputs: Record<string, unknown> },
): Promise<NewRevision> {
  const site = body.siteId ? await siteSnapshot(crewId, body.siteId) : null;
  if (body.siteId && !site)
    throw new RequestError(400, "Site: there is no such site in this crew; choose one of its sites or type a free span.", {
      siteId: "Choose one of the crew's sites, or none.",
    });
  const prepared = prepareRigInput({ ...body.inputs, name: body.name }, await kitCatalogue(crewId), site);
  if (prepared.problems.length) throw gearRefusal(prepared.problems);
  let result;
  try {
    result = evaluateRig(prepared.input);
  } catch (error) {
    if (error instanceof RigInputError) throw rigInputRefusal(error, units);
    throw error;
  }
  const mainline = prepared.input.mainline as { name: string };
  return {
    name: body.name,
    siteId: body.siteId,
    inputs: prepared.input,
    snapshot: prepared.snapshot,
    result,
    engineVersion: result.engineVersion,
    spanM: Number(prepared.input.spanM),
    mainlineName: mainline.name,
  };
}
