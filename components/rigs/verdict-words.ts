import type { RigResult } from "@/physics";
import type { VerdictTone } from "./verdict";

/** The brake verdict's word and tone: the one place the planner, its summary and the rig card read them. */
export const BRAKE_VERDICTS: Record<RigResult["brake"]["verdict"], { tone: VerdictTone; word: string }> = {
  holds: { tone: "ok", word: "Holds" },
  holds_below_margin: { tone: "caution", word: "Holds, below the crew's margin" },
  slips: { tone: "danger", word: "Slips" },
  untested: { tone: "caution", word: "Untested for this rope" },
};
