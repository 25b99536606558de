import { inputFigureDigits } from "@/lib/figures";
import { unitLabel, type UnitSystem } from "@/lib/rig-form/quantities";
import { kindOf, labelOf } from "./fields";
import { SLIP_RESULT_WORDS } from "@/lib/validations/slip-tests";

// What differs between two rig inputs, field by field, in the words and units of the form: for the
// revision history, and for a save that met a newer revision (which of my edits to carry over).

type Json = unknown;

const isObject = (v: Json): v is Record<string, Json> => typeof v === "object" && v !== null && !Array.isArray(v);

/**
 * The paths at which `a` and `b` differ. Objects are compared key by key and lists of the same length
 * item by item; a list whose length changed differs as a whole, since its items no longer line up.
 */
export function differingPaths(a: Json, b: Json, path = ""): string[] {
  const at = (key: string | number) => (path ? `${path}.${key}` : String(key));
  if (isObject(a) && isObject(b)) {
    const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])];
    return keys.flatMap((k) => differingPaths(a[k], b[k], at(k)));
  }
  if (Array.isArray(a) && Array.isArray(b) && a.length === b.length) return a.flatMap((item, i) => differingPaths(item, b[i], at(i)));
  return JSON.stringify(a) === JSON.stringify(b) ? [] : [path];
}

export function valueAt(value: Json, path: string): Json {
  if (path === "") return value;
  return path.split(".").reduce<Json>((v, key) => (v === null || typeof v !== "object" ? undefined : (v as Record<string, Json>)[key]), value);
}

function withValueAt(target: Json, path: string, value: Json): Json {
  if (path === "") return structuredClone(value);
  const [key, ...rest] = path.split(".");
  const container: Record<string, Json> | Json[] = Array.isArray(target) ? [...target] : isObject(target) ? { ...target } : /^\d+$/.test(key) ? [] : {};
  const current = (container as Record<string, Json>)[key];
  const next = withValueAt(current, rest.join("."), value);
  if (next === undefined) delete (container as Record<string, Json>)[key];
  else (container as Record<string, Json>)[key] = next;
  return container;
}

/** `newer` with every edit made from `base` to `edited` carried over onto it. */
export function reapplyEdits<T>(newer: T, base: Json, edited: Json): T {
  return differingPaths(base, edited).reduce<Json>((value, path) => withValueAt(value, path, valueAt(edited, path)), newer) as T;
}

const CHOICE_WORDS: Record<string, string> = {
  a: "anchor A",
  b: "anchor B",
  single: "single point",
  bridle: "two-leg bridle",
  line: "the line tension",
  leg: "one leg",
  tail: "on the crew's tail",
  stage: "on an inner stage",
  ...SLIP_RESULT_WORDS,
};

export interface InputDifference {
  path: string;
  label: string;
  before: string;
  after: string;
}

/** A value of an input as a person reads it in the form: the crew's units, names for Kit picks, words for choices. */
export function shownValue(path: string, value: Json, units: UnitSystem, modelName: (id: string) => string | undefined): string {
  if (value === undefined || value === null || value === "") return "—";
  const kind = kindOf(path);
  if (kind === "pick") return typeof value === "string" ? (modelName(value) ?? "gear no longer in the Kit") : "typed, not from the Kit";
  if (kind === "flag") return value ? "yes" : "no";
  if (kind === "choice" && typeof value === "string") return CHOICE_WORDS[value] ?? value;
  if (typeof value === "number") {
    if (kind === "text" || kind === "choice" || kind === "list") return String(value);
    const unit = unitLabel(kind, units);
    return `${inputFigureDigits(value, kind, units)}${unit ? ` ${unit}` : ""}`;
  }
  if (Array.isArray(value)) return `${value.length} ${value.length === 1 ? "entry" : "entries"}`;
  if (isObject(value)) return Object.keys(value).length ? "given" : "—";
  return String(value);
}

/** Every input that differs between two rigs, labelled as the form labels it, in the crew's units. */
export function inputDifferences(before: Json, after: Json, units: UnitSystem, modelName: (id: string) => string | undefined): InputDifference[] {
  return differingPaths(before, after).map((path) => ({
    path,
    label: labelOf(path, units),
    before: shownValue(path, valueAt(before, path), units, modelName),
    after: shownValue(path, valueAt(after, path), units, modelName),
  }));
}
