"use client";

import { useRouter } from "next/navigation";
import type { InputHTMLAttributes } from "react";
import { useFieldArray, useWatch, type Control } from "react-hook-form";
import type { z } from "zod";
import { FormError } from "@/components/forms/form-error";
import { useApiForm } from "@/components/forms/use-api-form";
import { useQuantityText } from "@/components/forms/use-quantity-text";
import { Button } from "@/components/ui/button";
import { Field, FieldFrame, controlClasses } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import {
  GEAR_KINDS,
  GEAR_KIND_LABELS,
  CONSTRUCTIONS,
  CONSTRUCTION_LABELS,
  GearModelSchema,
  SPEC_KEYS,
  measureLabel,
  measureRange,
  measureUnit,
  type GearKind,
  type GearModel,
  type GearModelInput,
  type MeasureKey,
} from "@/lib/validations/kit";
import { asGiven, stretchTensionDigits } from "@/lib/figures";
import { fromShown, unitLabel, type UnitSystem } from "@/lib/rig-form/quantities";
import { specDigits, specFromShown } from "./spec-summary";

// One form for every kind: the fields a kind shows are the keys of that kind's spec schema.
interface FormValues {
  kind: GearKind;
  name: string;
  notes: string;
  specs: Record<string, unknown> & { stretchPoints?: { tensionKN?: number; elongationPct?: number }[] };
}

/** The message of the error at a dotted path of react-hook-form's errors ("specs.stretchPoints.1.tensionKN"). */
function errorAt(errors: unknown, path: string): string | undefined {
  let node: unknown = errors;
  for (const part of path.split(".")) node = (node as Record<string, unknown> | undefined)?.[part];
  const message = (node as { message?: unknown } | undefined)?.message;
  return typeof message === "string" ? message : undefined;
}

const ORIGIN_AND_ONE = [
  { tensionKN: 0, elongationPct: 0 },
  { tensionKN: undefined, elongationPct: undefined },
];

function emptySpecs(kind: GearKind): FormValues["specs"] {
  const keys = SPEC_KEYS[kind];
  return {
    ...(keys.includes("stretchPoints") ? { stretchPoints: ORIGIN_AND_ONE } : {}),
    ...(keys.includes("construction") ? { construction: "static" } : {}),
  };
}

interface GearModelFormProps {
  /** The model being edited; a new model when absent. */
  model?: { id: string } & GearModelInput;
  units: UnitSystem;
}

type FormControl = Control<FormValues, unknown, GearModel>;

/** One spec's box, in the crew's units; the form keeps the value in the Kit's own unit. */
function SpecField({ control, specKey, units }: { control: FormControl; specKey: MeasureKey; units: UnitSystem }) {
  const { input, error } = useQuantityText(
    control,
    `specs.${specKey}`,
    (kept) => specDigits(specKey, kept, units),
    (shown) => specFromShown(specKey, shown, units),
  );
  const unit = measureUnit(specKey, units);
  return (
    <Field
      label={`${measureLabel(specKey, units)}${unit ? ` (${unit})` : ""}`}
      hint={`${measureRange(specKey, units)}${specKey === "mbsKN" ? " — the rated minimum breaking strength, from the maker or a destructive test" : ""}`}
      error={error}
      {...input}
    />
  );
}

/** A stretch point's tension box: the crew's unit shown, kN kept (as the engine's stretch curve takes it). */
function TensionInput({ control, index, units }: { control: FormControl; index: number; units: UnitSystem }) {
  const { input, error } = useQuantityText(
    control,
    `specs.stretchPoints.${index}.tensionKN`,
    (kN) => stretchTensionDigits(kN, units),
    (shown) => fromShown(shown, "stretchTension", units),
  );
  return <PointCell label={`Point ${index + 1} tension, ${unitLabel("stretchTension", units)}`} error={error} input={input} />;
}

function PointCell({ label, error, input }: { label: string; error?: string; input: InputHTMLAttributes<HTMLInputElement> }) {
  return (
    <td className="pb-2 pr-3 align-top">
      <input aria-label={label} inputMode="decimal" aria-invalid={error ? true : undefined} className={controlClasses} {...input} />
      {error ? (
        <p role="alert" className="text-sm text-danger-700">
          {error}
        </p>
      ) : null}
    </td>
  );
}

function ElongationInput({ control, index }: { control: FormControl; index: number }) {
  const { input, error } = useQuantityText(control, `specs.stretchPoints.${index}.elongationPct`, asGiven, (shown) => shown);
  return <PointCell label={`Point ${index + 1} elongation, %`} error={error} input={input} />;
}

export function GearModelForm({ model, units }: GearModelFormProps) {
  const router = useRouter();
  const schema = GearModelSchema[units];
  // The form holds every kind's fields loosely; the schema checks the chosen kind's.
  const { form, submit, formError } = useApiForm<FormValues, GearModel>(schema as unknown as z.ZodType<GearModel, FormValues>, {
    url: model ? `/api/kit/models/${model.id}` : "/api/kit/models",
    method: model ? "PATCH" : "POST",
    defaultValues: model ? (model as FormValues) : { kind: "webbing", name: "", notes: "", specs: emptySpecs("webbing") },
    onSuccess: (body) => {
      router.push(`/kit/models/${(body.model as { id: string }).id}`);
      router.refresh();
    },
  });
  const { register, setValue, formState, control } = form;
  const { errors, isSubmitting } = formState;
  const kind = useWatch({ control, name: "kind" }) as GearKind;
  const points = useFieldArray({ control, name: "specs.stretchPoints" as "specs.stretchPoints" & never });
  const specKeys = SPEC_KEYS[kind];

  return (
    <form onSubmit={submit} noValidate className="max-w-2xl space-y-5">
      {model ? (
        <p>
          <span className="font-semibold">Kind:</span> {GEAR_KIND_LABELS[model.kind]} (fixed once recorded)
        </p>
      ) : (
        <Select
          label="Kind"
          options={GEAR_KINDS.map((k) => ({ value: k, label: GEAR_KIND_LABELS[k] }))}
          {...register("kind", { onChange: (event) => setValue("specs", emptySpecs(event.target.value as GearKind)) })}
        />
      )}
      <Field label="Name" hint="An invented name or the maker's model name, as written on the gear." error={errors.name?.message} {...register("name")} />
      <fieldset className="space-y-4 rounded-panel border border-ink-200 p-4">
        <legend className="px-1 font-semibold">{GEAR_KIND_LABELS[kind]} specs</legend>
        {specKeys.map((key) => {
          if (key === "stretchPoints") return null;
          if (key === "construction") {
            return (
              <Select
                key={key}
                label="Construction"
                options={CONSTRUCTIONS.map((c) => ({ value: c, label: CONSTRUCTION_LABELS[c] }))}
                error={errorAt(errors, "specs.construction")}
                {...register("specs.construction")}
              />
            );
          }
          return <SpecField key={key} control={control} specKey={key as MeasureKey} units={units} />;
        })}
        {specKeys.includes("stretchPoints") ? (
          <FieldFrame
            id="stretch-points"
            label="Stretch points (tension and elongation)"
            error={errorAt(errors, "specs.stretchPoints") ?? errorAt(errors, "specs.stretchPoints.root")}
          >
            <p id="stretch-points" className="text-sm text-ink-500">
              From the maker&apos;s stretch chart or your own pull test: the first point is the origin, then tension and elongation both rising.
            </p>
            <table className="mt-2 text-sm">
              <thead>
                <tr>
                  <th scope="col" className="pr-3 text-left">
                    Tension ({unitLabel("stretchTension", units)})
                  </th>
                  <th scope="col" className="pr-3 text-left">
                    Elongation (%)
                  </th>
                  <th scope="col">
                    <span className="sr-only">Remove</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {points.fields.map((field, i) => (
                  <tr key={field.id}>
                    <TensionInput control={control} index={i} units={units} />
                    <ElongationInput control={control} index={i} />
                    <td className="pb-2 align-top">
                      <Button tone="quiet" onClick={() => points.remove(i)} disabled={points.fields.length <= 2} aria-label={`Remove point ${i + 1}`}>
                        ×
                      </Button>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            <Button tone="secondary" onClick={() => points.append({ tensionKN: undefined, elongationPct: undefined })}>
              Add a point
            </Button>
          </FieldFrame>
        ) : null}
      </fieldset>
      <FieldFrame id="model-notes" label="Notes" error={errors.notes?.message}>
        <textarea id="model-notes" rows={3} className={`${controlClasses} py-2`} {...register("notes")} />
      </FieldFrame>
      <FormError message={formError} />
      <Button type="submit" disabled={isSubmitting}>
        {model ? "Save changes" : "Add to the Kit"}
      </Button>
    </form>
  );
}
