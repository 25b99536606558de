"use client";

import { createContext, useContext, useSyncExternalStore } from "react";
import { messageInUnits, type QuantityKind, type UnitSystem } from "@/lib/rig-form/quantities";
import { allowedSentence } from "@/lib/planner/problems";

/**
 * Problems found beyond a form's schema (the engine's, the Kit's), each under the field it concerns.
 * A store rather than a context value, so that a new evaluation re-renders only the fields whose problem changed.
 */
export interface FieldProblems {
  subscribe(onChange: () => void): () => void;
  problemAt(name: string): string | undefined;
}

export interface ProblemStore extends FieldProblems {
  publish(problems: Readonly<Record<string, string>>): void;
}

export function createProblemStore(): ProblemStore {
  let current: Readonly<Record<string, string>> = {};
  const listeners = new Set<() => void>();
  return {
    subscribe(onChange) {
      listeners.add(onChange);
      return () => listeners.delete(onChange);
    },
    problemAt: (name) => current[name],
    publish(problems) {
      current = problems;
      for (const listener of listeners) listener();
    },
  };
}

const NO_PROBLEMS: FieldProblems = { subscribe: () => () => undefined, problemAt: () => undefined };

interface FormSettings {
  /** The crew's units: what people read and type. */
  units: UnitSystem;
  /** Final sentences from beyond the schema, by field. */
  problems: FieldProblems;
  /** "allowed": the schema's messages say only what is allowed (the engine's schema); "sentence": they are whole sentences. */
  schemaMessages: "allowed" | "sentence";
}

const FormSettingsContext = createContext<FormSettings>({ units: "si", problems: NO_PROBLEMS, schemaMessages: "sentence" });

/** Give it a value that stays the same object between renders: every field reads it. */
export const FormSettingsProvider = FormSettingsContext.Provider;

export function useUnits(): UnitSystem {
  return useContext(FormSettingsContext).units;
}

/**
 * The sentence to show beside a field: the schema's message in the crew's units, or else the problem the
 * engine, the Kit or the server found there.
 */
export function useFieldProblem(name: string, schemaMessage: string | undefined, kind: QuantityKind = "plain"): string | undefined {
  const { problems, units, schemaMessages } = useContext(FormSettingsContext);
  const outer = useSyncExternalStore(
    problems.subscribe,
    () => problems.problemAt(name),
    () => problems.problemAt(name),
  );
  if (schemaMessage === undefined) return outer;
  const inUnits = messageInUnits(schemaMessage, kind, units);
  return schemaMessages === "allowed" ? allowedSentence(inUnits) : inUnits;
}
