"use client";

import { useRouter } from "next/navigation";
import { useFieldArray, useWatch } from "react-hook-form";
import type { z } from "zod";
import { asNumber } from "@/components/forms/as-number";
import { FormError } from "@/components/forms/form-error";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { Field, FieldFrame, controlClasses } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import {
  GEAR_KINDS,
  GEAR_KIND_LABELS,
  GearModelSchema,
  MEASURES,
  SPEC_SCHEMAS,
  type GearKind,
  type GearModelInput,
  type MeasureKey,
} from "@/lib/validations/kit";

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
  const keys = Object.keys(SPEC_SCHEMAS[kind].shape);
  return {
    ...(keys.includes("stretchPoints") ? { stretchPoints: ORIGIN_AND_ONE } : {}),
    ...(keys.includes("construction") ? { construction: "static" } : {}),
  };
}

interface GearModelFormProps {
  /** The model being edited; a new model when absent. */
  model?: { id: string } & GearModelInput;
}

export function GearModelForm({ model }: GearModelFormProps) {
  const router = useRouter();
  // The form holds every kind's fields loosely; the schema checks the chosen kind's.
  const { form, submit, formError } = useApiForm(GearModelSchema as unknown as z.ZodType<z.output<typeof GearModelSchema>, FormValues>, {
    url: model ? `/api/kit/models/${model.id}` : "/api/kit/models",
    method: model ? "PATCH" : "POST",
    defaultValues: model ? (model as FormValues) : { kind: "webbing", name: "", notes: "", specs: emptySpecs("webbing") },
    onSuccess: (body) => {
      router.push(`/kit/models/${(body.model as { id: string }).id}`);
      router.refresh();
    },
  });
  const { register, setValue, formState } = form;
  const { errors, isSubmitting } = formState;
  const kind = useWatch({ control: form.control, name: "kind" }) as GearKind;
  const points = useFieldArray({ control: form.control, name: "specs.stretchPoints" as "specs.stretchPoints" & never });
  const specKeys = Object.keys(SPEC_SCHEMAS[kind].shape);

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
                options={[
                  { value: "static", label: "Static (low stretch)" },
                  { value: "dynamic", label: "Dynamic (climbing rope)" },
                ]}
                error={errorAt(errors, "specs.construction")}
                {...register("specs.construction")}
              />
            );
          }
          const measure = MEASURES[key as MeasureKey];
          return (
            <Field
              key={key}
              label={measure.unit ? `${measure.label} (${measure.unit})` : `${measure.label} (fraction of 1)`}
              inputMode="decimal"
              hint={`${measure.min}–${measure.max}${key === "mbsKN" ? " — the rated minimum breaking strength, from the maker or a destructive test" : ""}`}
              error={errorAt(errors, `specs.${key}`)}
              {...register(`specs.${key}`, { setValueAs: asNumber })}
            />
          );
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
                    Tension (kN)
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
                    {(["tensionKN", "elongationPct"] as const).map((part) => {
                      const message = errorAt(errors, `specs.stretchPoints.${i}.${part}`);
                      return (
                        <td key={part} className="pb-2 pr-3 align-top">
                          <input
                            aria-label={`Point ${i + 1} ${part === "tensionKN" ? "tension, kN" : "elongation, %"}`}
                            inputMode="decimal"
                            aria-invalid={message ? true : undefined}
                            className={controlClasses}
                            {...register(`specs.stretchPoints.${i}.${part}`, { setValueAs: asNumber })}
                          />
                          {message ? (
                            <p role="alert" className="text-sm text-danger-700">
                              {message}
                            </p>
                          ) : null}
                        </td>
                      );
                    })}
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
