"use client";

import { createContext, useContext } from "react";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import type { SlipResult } from "@/physics";

/** An input problem the engine found beyond the schema (e.g. a pretension above the MBS), to show beside its field. */
export interface EngineFieldError {
  field: string;
  allowed: string;
}

interface RigFormSettings {
  units: UnitSystem;
  engineError: EngineFieldError | null;
  /** The crew's own slip bench: every brake check counts these results, and the brake fields offer their devices and diameters. */
  crewBench: readonly SlipResult[];
}

const RigFormContext = createContext<RigFormSettings>({ units: "si", engineError: null, crewBench: [] });

export const RigFormSettingsProvider = RigFormContext.Provider;

export function useRigFormSettings(): RigFormSettings {
  return useContext(RigFormContext);
}

/** The sentence beside a field: what is allowed, in the person's words and units. */
export function allowedSentence(allowed: string | undefined): string | undefined {
  return allowed ? `Allowed: ${allowed}.` : undefined;
}

/** The schema's error at `name`, or the engine's when it names this same field. */
export function useFieldProblem(name: string, schemaMessage: string | undefined): string | undefined {
  const { engineError } = useRigFormSettings();
  return schemaMessage ?? (engineError?.field === name ? engineError.allowed : undefined);
}
