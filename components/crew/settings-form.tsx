"use client";

import { useMemo } from "react";
import { useRouter } from "next/navigation";
import { FormProvider } from "react-hook-form";
import { CrewSettingsSchema, MINIMUM_CLEARANCE_LABEL, SAFETY_FACTOR_CLASSES, SAFETY_FACTOR_LABELS, type CrewSettings } from "@/lib/validations/crew";
import { useApiForm } from "@/components/forms/use-api-form";
import { createProblemStore, FormSettingsProvider } from "@/components/forms/form-settings";
import { QuantityField } from "@/components/forms/fields";
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
  // The clearance is stored in metres and typed in the crew's saved units.
  const formSettings = useMemo(() => ({ units: settings.units, problems: createProblemStore(), schemaMessages: "sentence" as const }), [settings.units]);
  return (
    <FormSettingsProvider value={formSettings}>
      <FormProvider {...form}>
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
                MBS divided by the peak load a component sees must reach these. The defaults of 3 are common practice (no published source); follow the
                standards and local rules where you rig.
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
            <div>
              <h2 className="text-lg">Clearance below a fall</h2>
              <p className="mb-3 text-sm text-ink-600">
                After a leash fall, or a fall caught by the backup when the mainline fails, the walker&apos;s lowest point must stay at least this far above the
                ground. The default of 2 m is common practice (no published source); keep far more where you can.
              </p>
              <div className="grid gap-4 sm:grid-cols-2">
                <QuantityField name="minClearanceM" label={MINIMUM_CLEARANCE_LABEL} kind="length" readOnly={!editable} />
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
      </FormProvider>
    </FormSettingsProvider>
  );
}
