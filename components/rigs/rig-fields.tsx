"use client";

import { useId, useState, type ReactNode } from "react";
import { get, useController, useFormContext, useFormState, type FieldErrors } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { Select, type SelectOption } from "@/components/ui/select";
import { inputText, messageInUnits, parseTyped, unitLabel, type QuantityKind } from "@/lib/rig-form/quantities";
import type { RigInputDraft } from "@/physics";
import { allowedSentence, useFieldProblem, useRigFormSettings } from "./rig-form-context";

// Field paths into the rig input; the discriminated unions (anchor layout, brake location) defeat react-hook-form's path type.
type RigPath = string;

/** The schema's message at a field, or at a list's own level (too few rows). */
function messageAt(errors: FieldErrors<RigInputDraft>, name: RigPath): string | undefined {
  const error = get(errors, name) as { message?: unknown; root?: { message?: string } } | undefined;
  if (typeof error?.message === "string") return error.message;
  return error?.root?.message;
}

interface QuantityFieldProps {
  name: RigPath;
  label: string;
  kind: QuantityKind;
  /** A blank box leaves the value out (the engine's default applies) instead of being an error. */
  optional?: boolean;
  hint?: ReactNode;
  /** Values to offer as the person types (they may still type another). */
  suggestions?: readonly string[];
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
 * A number in the crew's units. The form holds SI (what the schema and the engine take); this box
 * converts at the edge and keeps the person's own text while they type.
 */
export function QuantityField({ name, label, kind, optional = false, hint, suggestions }: QuantityFieldProps) {
  const { units } = useRigFormSettings();
  const { list, options } = useSuggestions(suggestions);
  const {
    field: { ref, onChange, onBlur, value: held },
    fieldState,
  } = useController<RigInputDraft>({ name: name as never });
  const value = held as number | undefined;
  const [typed, setTyped] = useState({ text: inputText(value, kind, units), value });
  // The form changed the value itself (a reset, a new row): show the new value.
  if (!Object.is(typed.value, value)) setTyped({ text: inputText(value, kind, units), value });
  const problem = useFieldProblem(name, fieldState.error?.message);
  const unit = unitLabel(kind, units);
  return (
    <>
      <Field
        label={unit ? `${label} (${unit})` : label}
        inputMode="decimal"
        autoComplete="off"
        list={list}
        name={name}
        ref={ref}
        value={typed.text}
        onBlur={onBlur}
        onChange={(event) => {
          const next = parseTyped(event.target.value, kind, units, optional);
          setTyped({ text: event.target.value, value: next });
          onChange(next);
        }}
        hint={hint}
        error={allowedSentence(problem && messageInUnits(problem, kind, units))}
      />
      {options}
    </>
  );
}

/** A text box for a name in the rig input. */
export function TextField({ name, label, suggestions, hint }: { name: RigPath; label: string; suggestions?: readonly string[]; hint?: ReactNode }) {
  const { register } = useFormContext<RigInputDraft>();
  const { errors } = useFormState<RigInputDraft>();
  const problem = useFieldProblem(name, messageAt(errors, name));
  const { list, options } = useSuggestions(suggestions);
  return (
    <>
      <Field label={label} autoComplete="off" list={list} hint={hint} error={allowedSentence(problem)} {...register(name as never)} />
      {options}
    </>
  );
}

/** A native select over fixed choices in the rig input. */
export function ChoiceField({ name, label, options }: { name: RigPath; label: string; options: SelectOption[] }) {
  const { register } = useFormContext<RigInputDraft>();
  const { errors } = useFormState<RigInputDraft>();
  const problem = useFieldProblem(name, messageAt(errors, name));
  return <Select label={label} options={options} error={allowedSentence(problem)} {...register(name as never)} />;
}

/** A problem with a whole group (too few rows, a choice between two fields) shown at the group's head. */
export function GroupProblem({ name }: { name: RigPath }) {
  const { errors } = useFormState<RigInputDraft>();
  const problem = useFieldProblem(name, messageAt(errors, name));
  const { units } = useRigFormSettings();
  if (!problem) return null;
  return (
    <p role="alert" className="text-sm font-medium text-danger-700">
      {allowedSentence(messageInUnits(problem, "plain", units))}
    </p>
  );
}
