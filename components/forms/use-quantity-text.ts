"use client";

import { useState } from "react";
import { useController, type Control, type FieldPath, type FieldValues } from "react-hook-form";

/**
 * A number box over a form value kept in another unit (kN, g/m, a fraction): the box shows `show(value)`
 * and keeps the person's own text while they type; only what they type is parsed back, so a value nobody
 * touched is saved exactly as it was, never re-read from its rounded text.
 */
export function useQuantityText<T extends FieldValues, Context, Output>(
  control: Control<T, Context, Output>,
  name: FieldPath<T>,
  show: (kept: number) => string,
  parse: (shown: number) => number,
) {
  const { field, fieldState } = useController({ control, name });
  const kept = field.value as number | undefined;
  const text = (value: number | undefined) => (value === undefined || !Number.isFinite(value) ? "" : show(value));
  const [typed, setTyped] = useState({ text: text(kept), value: kept });
  // The form set the value itself (a reset, a new row, a value read from a trace): show that value.
  if (!Object.is(typed.value, kept)) setTyped({ text: text(kept), value: kept });
  return {
    input: {
      name: field.name,
      ref: field.ref,
      onBlur: field.onBlur,
      value: typed.text,
      inputMode: "decimal" as const,
      autoComplete: "off",
      onChange: (event: { target: { value: string } }) => {
        const raw = event.target.value.trim().replace(",", ".");
        // A blank box is no value (the schema says it is required); anything else that is not a number stays NaN for the schema to name.
        const next = raw === "" ? undefined : Number.isFinite(Number(raw)) ? parse(Number(raw)) : Number.NaN;
        setTyped({ text: event.target.value, value: next });
        field.onChange(next);
      },
    },
    error: fieldState.error?.message,
  };
}
