import example from "@/physics/examples/quarry-highline.json";
import { RigInputSchema, type RigInputDraft } from "@/physics";
import { engineCrewMinimums, type CrewMinimums } from "@/lib/gear-categories";

/** The worked example (an invented quarry highline) with the crew's minimums: the page shows figures at once. */
export function startingRig(crew: Partial<CrewMinimums>, minClearanceM: number): RigInputDraft {
  return { ...RigInputSchema.parse(example), ...engineCrewMinimums(crew, minClearanceM) };
}
