"use client";

import { useId, useState, type ChangeEvent, type ReactNode } from "react";
import { get, useController, useFormContext, useFormState, type FieldErrors } from "react-hook-form";
import { controlClasses, describedBy, Field, TextArea } from "@/components/ui/field";
import { Select, type SelectOption } from "@/components/ui/select";
import { inputFigureDigits } from "@/lib/figures";
import { inputText, parseTyped, unitLabel, type QuantityKind } from "@/lib/rig-form/quantities";
import { useFieldProblem, useUnits } from "./form-settings";

// Fields bound by name to the react-hook-form around them, holding SI values and showing the crew's
// units. Paths are plain strings: discriminated unions (an anchor's layout, the brake's place) defeat
// react-hook-form's path types.
type FieldPath = string;
type Values = Record<string, unknown>;

/** The schema's message at a field, or at a list's own level (too few rows). */
function messageAt(errors: FieldErrors<Values>, name: FieldPath): string | undefined {
  const error = get(errors, name) as { message?: unknown; root?: { message?: string } } | undefined;
  if (typeof error?.message === "string") return error.message;
  return error?.root?.message;
}

interface QuantityFieldProps {
  name: FieldPath;
  label: string;
  kind: QuantityKind;
  /** A blank box leaves the value out (the engine's default applies) instead of being an error. */
  optional?: boolean;
  hint?: ReactNode;
  /** Values to offer as the person types (they may still type another). */
  suggestions?: readonly string[];
  /** Shown but not typed into: the figure comes from elsewhere (the Kit, the site). */
  readOnly?: boolean;
}

/** The browser's list of values offered under a box; `list` is the id to give the box, undefined when there is nothing to offer. */
function useSuggestions(suggestions: readonly string[] | undefined): { list: string | undefined; options: ReactNode } {
  const id = useId();
  if (!suggestions?.length) return { list: undefined, options: null };
  return {
    list: id,
    options: (
      <datalist id={id}>
        {suggestions.map((value) => (
          <option key={value} value={value} />
        ))}
      </datalist>
    ),
  };
}

/**
 * A number in the crew's units, bound to the form by name. The form holds SI (what the schema and the
 * engine take); the box converts at the edge and keeps the person's own text while they type.
 */
function useQuantityInput(name: FieldPath, kind: QuantityKind, optional: boolean, readOnly = false) {
  const units = useUnits();
  const {
    field: { ref, onChange, onBlur, value: held },
    fieldState,
  } = useController<Values>({ name: name as never });
  const value = held as number | undefined;
  const [typed, setTyped] = useState({ text: inputText(value, kind, units), value });
  // The form changed the value itself (a reset, a new row, a Kit pick): show the new value.
  if (!Object.is(typed.value, value)) setTyped({ text: inputText(value, kind, units), value });
  const problem = useFieldProblem(name, fieldState.error?.message, kind);
  const input = {
    inputMode: "decimal" as const,
    autoComplete: "off",
    name,
    ref,
    // A box nobody types in (filled from the Kit) shows the figure as the Kit does; a typed one keeps the person's text.
    value: readOnly && value !== undefined && Number.isFinite(value) ? inputFigureDigits(value, kind, units) : typed.text,
    onBlur,
    onChange: (event: ChangeEvent<HTMLInputElement>) => {
      const next = parseTyped(event.target.value, kind, units, optional);
      setTyped({ text: event.target.value, value: next });
      onChange(next);
    },
  };
  return { input, problem, unit: unitLabel(kind, units) };
}

export function QuantityField({ name, label, kind, optional = false, hint, suggestions, readOnly }: QuantityFieldProps) {
  const { list, options } = useSuggestions(suggestions);
  const { input, problem, unit } = useQuantityInput(name, kind, optional, readOnly);
  return (
    <>
      <Field label={unit ? `${label} (${unit})` : label} list={list} readOnly={readOnly} hint={hint} error={problem} {...input} />
      {options}
    </>
  );
}

/** The same number box for a table cell: its label is the column's, read out to screen readers; its problem shows under it. */
export function QuantityCell({ name, label, kind, readOnly }: { name: FieldPath; label: string; kind: QuantityKind; readOnly?: boolean }) {
  const { input, problem, unit } = useQuantityInput(name, kind, false, readOnly);
  const id = useId();
  return (
    <>
      <input
        id={id}
        aria-label={unit ? `${label} (${unit})` : label}
        readOnly={readOnly}
        {...describedBy(id, problem)}
        className={`${controlClasses} min-w-[5.5rem] tabular-nums read-only:border-dashed read-only:bg-ink-50`}
        {...input}
      />
      {problem ? (
        <p id={`${id}-error`} role="alert" className="mt-1 text-xs font-medium text-danger-700">
          {problem}
        </p>
      ) : null}
    </>
  );
}

/** A text box bound to the form. */
export function TextField({
  name,
  label,
  suggestions,
  hint,
  readOnly,
  multiline,
}: {
  name: FieldPath;
  label: string;
  suggestions?: readonly string[];
  hint?: ReactNode;
  readOnly?: boolean;
  multiline?: boolean;
}) {
  const { register } = useFormContext<Values>();
  const { errors } = useFormState<Values>();
  const problem = useFieldProblem(name, messageAt(errors, name));
  const { list, options } = useSuggestions(suggestions);
  return (
    <>
      {multiline ? (
        <TextArea label={label} hint={hint} error={problem} readOnly={readOnly} {...register(name as never)} />
      ) : (
        <Field label={label} autoComplete="off" list={list} hint={hint} error={problem} readOnly={readOnly} {...register(name as never)} />
      )}
      {options}
    </>
  );
}

/** A native select over fixed choices, bound to the form. */
export function ChoiceField({ name, label, options }: { name: FieldPath; label: string; options: SelectOption[] }) {
  const { register } = useFormContext<Values>();
  const { errors } = useFormState<Values>();
  const problem = useFieldProblem(name, messageAt(errors, name));
  return <Select label={label} options={options} error={problem} {...register(name as never)} />;
}

/** A problem with a whole group (too few rows, a choice between two fields) shown at the group's head. */
export function GroupProblem({ name }: { name: FieldPath }) {
  const { errors } = useFormState<Values>();
  const problem = useFieldProblem(name, messageAt(errors, name));
  if (!problem) return null;
  return (
    <p role="alert" className="text-sm font-medium text-danger-700">
      {problem}
    </p>
  );
}
