import example from "@/physics/examples/quarry-highline.json";
import { RigInputSchema, type RigInputDraft } from "@/physics";
import { engineMinimums, type CrewMinimums } from "@/lib/gear-categories";

/** The worked example (an invented quarry highline) with the crew's minimums: the page shows figures at once. */
export function startingRig(crew: Partial<CrewMinimums>): RigInputDraft {
  return { ...RigInputSchema.parse(example), minimumSafetyFactors: engineMinimums(crew) };
}
