import { fromKilograms, fromMetres, fromNewtons, toKilograms, toMetres, toNewtons } from "@/physics";

/** The crew's choice of units for what people read and type; the engine always works in SI. */
export type UnitSystem = "si" | "us";

/**
 * What a number in the rig input measures, named by the SI unit the engine takes it in:
 * `force` N, `stretchTension` kN (stretch points are kept as measured), `length` m, `mass` kg,
 * `massPerLength` kg/m, `fraction` 0…1. Anything else (mm, °, n of n:1, factors) is shown as is.
 */
export type QuantityKind = "force" | "stretchTension" | "length" | "mass" | "massPerLength" | "fraction" | "plain";

// 1 lb = 16 oz (avoirdupois, NIST SP 811 appendix B).
const OUNCES_PER_POUND = 16;

interface Conversion {
  unit: string;
  fromSI: (si: number) => number;
  toSI: (shown: number) => number;
}

const identity = (unit: string): Conversion => ({ unit, fromSI: (v) => v, toSI: (v) => v });

const CONVERSIONS: Record<UnitSystem, Record<Exclude<QuantityKind, "plain">, Conversion>> = {
  si: {
    force: { unit: "kN", fromSI: (n) => fromNewtons(n, "kN"), toSI: (v) => toNewtons(v, "kN") },
    stretchTension: identity("kN"),
    length: identity("m"),
    mass: identity("kg"),
    // Webbing is sold by grams per metre.
    massPerLength: { unit: "g/m", fromSI: (kgPerM) => kgPerM * 1000, toSI: (gPerM) => gPerM / 1000 },
    fraction: { unit: "%", fromSI: (f) => f * 100, toSI: (pct) => pct / 100 },
  },
  us: {
    force: { unit: "lbf", fromSI: (n) => fromNewtons(n, "lbf"), toSI: (v) => toNewtons(v, "lbf") },
    stretchTension: { unit: "lbf", fromSI: (kN) => fromNewtons(kN * 1000, "lbf"), toSI: (v) => toNewtons(v, "lbf") / 1000 },
    length: { unit: "ft", fromSI: (m) => fromMetres(m, "ft"), toSI: (v) => toMetres(v, "ft") },
    mass: { unit: "lb", fromSI: (kg) => fromKilograms(kg, "lb"), toSI: (v) => toKilograms(v, "lb") },
    massPerLength: {
      unit: "oz/ft",
      fromSI: (kgPerM) => fromKilograms(kgPerM, "lb") * OUNCES_PER_POUND * toMetres(1, "ft"),
      toSI: (ozPerFt) => toKilograms(ozPerFt / OUNCES_PER_POUND, "lb") / toMetres(1, "ft"),
    },
    fraction: { unit: "%", fromSI: (f) => f * 100, toSI: (pct) => pct / 100 },
  },
};

function conversion(kind: QuantityKind, units: UnitSystem): Conversion | null {
  return kind === "plain" ? null : CONVERSIONS[units][kind];
}

/** The unit a quantity is shown in, e.g. "kN" or "lbf"; "" for plain numbers. */
export function unitLabel(kind: QuantityKind, units: UnitSystem): string {
  return conversion(kind, units)?.unit ?? "";
}

/** An SI value as the number a person reads in their units. */
export function toShown(si: number, kind: QuantityKind, units: UnitSystem): number {
  return conversion(kind, units)?.fromSI(si) ?? si;
}

/** A number typed in the person's units as the SI value the engine takes. */
export function fromShown(shown: number, kind: QuantityKind, units: UnitSystem): number {
  return conversion(kind, units)?.toSI(shown) ?? shown;
}

/** A value for an input box: enough digits to round-trip what a person would type, no float noise. */
export function inputText(si: number | undefined, kind: QuantityKind, units: UnitSystem): string {
  if (si === undefined || !Number.isFinite(si)) return "";
  return String(Number(toShown(si, kind, units).toPrecision(6)));
}

/**
 * What a person typed, as the SI value for the form: a blank box is `undefined` when the field may be
 * left out and NaN otherwise, so the schema reports it (never a silent zero). A decimal comma is accepted.
 */
export function parseTyped(text: string, kind: QuantityKind, units: UnitSystem, optional: boolean): number | undefined {
  const trimmed = text.trim();
  if (trimmed === "") return optional ? undefined : Number.NaN;
  const typed = Number(trimmed.replace(",", "."));
  return Number.isFinite(typed) ? fromShown(typed, kind, units) : Number.NaN;
}

// The engine's and the schema's messages quote limits in SI ("> 0 N", "≤ 3000 m"); a person reads them in their units.
const SI_AMOUNT = /(-?\d+(?:\.\d+)?) ?(kN|N|kg\/m|kg|m)(?![A-Za-z/])/g;
const KIND_OF_SI_UNIT: Record<string, QuantityKind> = { N: "force", kN: "stretchTension", m: "length", kg: "mass", "kg/m": "massPerLength" };
const BARE_NUMBER = /(?<![\d.])(\d+(?:\.\d+)?)(?![\d.]| ?%)/g;

function shownAmount(si: number, kind: QuantityKind, units: UnitSystem): string {
  return `${Number(toShown(si, kind, units).toPrecision(6))} ${unitLabel(kind, units)}`;
}

/** Rewrites the SI amounts in a message into the person's units; for a fraction field, bare numbers become per cent. */
export function messageInUnits(message: string, kind: QuantityKind, units: UnitSystem): string {
  const converted = message.replace(SI_AMOUNT, (_all, amount: string, unit: string) => shownAmount(Number(amount), KIND_OF_SI_UNIT[unit], units));
  return kind === "fraction" ? converted.replace(BARE_NUMBER, (amount: string) => shownAmount(Number(amount), "fraction", units)) : converted;
}
