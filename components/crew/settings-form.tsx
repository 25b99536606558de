"use client";

import { useRouter } from "next/navigation";
import { CrewSettingsSchema, SAFETY_FACTOR_CLASSES, SAFETY_FACTOR_LABELS, type CrewSettings } from "@/lib/validations/crew";
import { useApiForm } from "@/components/forms/use-api-form";
import { FormError } from "@/components/forms/form-error";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/ui/toast";

export function CrewSettingsForm({ settings, editable }: { settings: CrewSettings; editable: boolean }) {
  const router = useRouter();
  const notify = useToast();
  const { form, submit, formError } = useApiForm(CrewSettingsSchema, {
    url: "/api/crew/settings",
    method: "PATCH",
    defaultValues: settings,
    onSuccess: () => {
      notify({ title: "Crew settings saved", tone: "ok" });
      router.refresh();
    },
  });
  const errors = form.formState.errors;
  return (
    <form onSubmit={submit} noValidate className="max-w-2xl space-y-6">
      <FormError message={formError} />
      <fieldset disabled={!editable} className="space-y-6">
        <Select
          label="Units"
          options={[
            { value: "si", label: "SI (kN, m, kg)" },
            { value: "us", label: "US (lbf, ft, lb)" },
          ]}
          error={errors.units?.message}
          {...form.register("units")}
        />
        <div>
          <h2 className="text-lg">Minimum safety factors</h2>
          <p className="mb-3 text-sm text-ink-600">
            MBS divided by the peak load a component sees must reach these. The defaults of 3 are common practice (no published source); follow the standards
            and local rules where you rig.
          </p>
          <div className="grid gap-4 sm:grid-cols-2">
            {SAFETY_FACTOR_CLASSES.map((c) => (
              <Field
                key={c}
                label={SAFETY_FACTOR_LABELS[c]}
                type="number"
                step="0.1"
                inputMode="decimal"
                error={errors.minSafetyFactors?.[c]?.message}
                {...form.register(`minSafetyFactors.${c}`, { valueAsNumber: true })}
              />
            ))}
          </div>
        </div>
        <label className="flex min-h-target items-center gap-3">
          <input type="checkbox" className="h-6 w-6" {...form.register("allowSelfSignOff")} />
          <span>Whoever drafted a plan may also sign it off, when they are a lead or owner (off: a second person must check it)</span>
        </label>
      </fieldset>
      {editable ? (
        <Button type="submit" disabled={form.formState.isSubmitting}>
          Save settings
        </Button>
      ) : (
        <p className="text-ink-600">Only a lead or an owner can change these settings.</p>
      )}
    </form>
  );
}
