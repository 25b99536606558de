"use client";

import { createContext, useContext } from "react";
import type { KitCatalogue, KitModel, SiteSnapshot } from "@/lib/planner/kit";

interface PlannerSettings {
  catalogue: KitCatalogue;
  /** The sites a rig may stand on (the crew's sites in use, and the rig's own). */
  sites: readonly SiteSnapshot[];
  /** False where the person may only read the rig. */
  editable: boolean;
}

const PlannerContext = createContext<PlannerSettings>({ catalogue: { models: [], bench: [] }, sites: [], editable: false });

/** Give it a value that stays the same object between renders. */
export const PlannerProvider = PlannerContext.Provider;

export function usePlanner(): PlannerSettings {
  return useContext(PlannerContext);
}

export function modelById(catalogue: KitCatalogue, id: unknown): KitModel | undefined {
  return typeof id === "string" ? catalogue.models.find((m) => m.id === id) : undefined;
}
