import type { RigResult } from "@/physics";
import type { RevisionState } from "@/lib/validations/rigs";
import { plannerValues, type RevisionSnapshot } from "./kit";

type Values = Record<string, unknown>;

/** A saved revision as the planner holds it: who saved it, when, and the form's values it holds. */
export interface SavedRevision {
  id: string;
  number: number;
  state: RevisionState;
  authorName: string | null;
  createdAt: string;
  values: Values;
}

/** A revision as the routes send it. */
export interface RevisionBody {
  id: string;
  number: number;
  state: RevisionState;
  authorName: string | null;
  createdAt: string;
  rigId: string;
  inputs: Values;
  snapshot: RevisionSnapshot;
  result: RigResult;
}

export const savedRevision = (r: RevisionBody): SavedRevision => ({
  id: r.id,
  number: r.number,
  state: r.state,
  authorName: r.authorName,
  createdAt: r.createdAt,
  values: plannerValues(r),
});
