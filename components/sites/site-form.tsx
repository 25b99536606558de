"use client";

import { useMemo, type ReactNode } from "react";
import { useRouter } from "next/navigation";
import { FormProvider, useController, useFieldArray, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import { FormError } from "@/components/forms/form-error";
import { useApiForm } from "@/components/forms/use-api-form";
import { ChoiceField, GroupProblem, QuantityCell, QuantityField, TextField } from "@/components/forms/fields";
import { createProblemStore, FormSettingsProvider } from "@/components/forms/form-settings";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import {
  ANCHOR_KIND_LABELS,
  ANCHOR_KINDS,
  MEASUREMENT_LABELS,
  MEASUREMENT_METHODS,
  SiteSchema,
  type AnchorKind,
  type Site,
  type SiteInput,
} from "@/lib/validations/sites";

const Pair = ({ children }: { children: ReactNode }) => <div className="grid gap-4 sm:grid-cols-2">{children}</div>;

function Panel({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="min-w-0 space-y-4 rounded-panel border border-ink-200 bg-white p-4 shadow-panel">
      <legend className="px-1 text-lg font-semibold text-ink-900">{title}</legend>
      {children}
    </fieldset>
  );
}

const GROUND_CHOICES = [
  { value: "none", label: "Not measured" },
  { value: "level", label: "Level ground: one height below anchor A" },
  { value: "profile", label: "A profile: heights at distances from A" },
];

/** The profile's points; mounted with the profile, so the list starts from the points the profile holds. */
function GroundPoints() {
  const points = useFieldArray<SiteInput, "ground.points" & never>({ name: "ground.points" as never });
  return (
    <div className="space-y-2">
      <GroupProblem name="ground.points" />
      <table className="w-full text-left text-sm">
        <caption className="pb-1 text-left font-semibold">Ground points, from A towards B</caption>
        <thead>
          <tr className="border-b border-ink-200">
            <th scope="col" className="py-1 pr-2">
              Distance from A
            </th>
            <th scope="col" className="py-1 pr-2">
              Ground height
            </th>
            <th scope="col">
              <span className="sr-only">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {points.fields.map((point, i) => (
            <tr key={point.id} className="align-top">
              <td className="py-1 pr-2">
                <QuantityCell name={`ground.points.${i}.xM`} label={`Ground point ${i + 1} distance from A`} kind="length" />
              </td>
              <td className="py-1 pr-2">
                <QuantityCell name={`ground.points.${i}.heightM`} label={`Ground point ${i + 1} height`} kind="length" />
              </td>
              <td className="py-1">
                <Button tone="quiet" onClick={() => points.remove(i)} disabled={points.fields.length <= 1} aria-label={`Remove ground point ${i + 1}`}>
                  ✕
                </Button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <Button tone="secondary" onClick={() => points.append({ xM: Number.NaN, heightM: Number.NaN } as never)}>
        Add a ground point
      </Button>
    </div>
  );
}

function GroundFields() {
  const {
    field: { ref, onChange, onBlur, value },
  } = useController<SiteInput, "ground">({ name: "ground" });
  const kind = value.kind;
  return (
    <Panel title="Ground under the line">
      <p className="text-sm text-ink-600">
        Heights are relative to anchor A, negative below it. The planner draws the ground on the side view and works out how close a fall comes to it.
      </p>
      <Select
        label="Ground"
        options={GROUND_CHOICES}
        value={kind}
        name="ground"
        ref={ref}
        onBlur={onBlur}
        onChange={(event) => {
          const next = event.target.value;
          onChange(
            next === "level"
              ? { kind: "level", heightAboveGroundM: Number.NaN }
              : next === "profile"
                ? { kind: "profile", points: [{ xM: 0, heightM: Number.NaN }] }
                : { kind: "none" },
          );
        }}
      />
      {kind === "level" ? <QuantityField name="ground.heightAboveGroundM" label="Height of anchor A above the ground" kind="length" /> : null}
      {kind === "profile" ? <GroundPoints /> : null}
    </Panel>
  );
}

function AnchorFields({ side }: { side: "a" | "b" }) {
  const title = `Anchor ${side.toUpperCase()}`;
  const {
    field: { onChange, value },
  } = useController<SiteInput, `anchors.${typeof side}`>({ name: `anchors.${side}` });
  const kind = useWatch<SiteInput, `anchors.${typeof side}.kind`>({ name: `anchors.${side}.kind` });
  return (
    <Panel title={title}>
      <Select
        label={`${title} kind`}
        options={ANCHOR_KINDS.map((k) => ({ value: k, label: ANCHOR_KIND_LABELS[k] }))}
        value={kind}
        name={`anchors.${side}.kind`}
        onChange={(event) => {
          const next = event.target.value as AnchorKind;
          const notes = value.notes ?? "";
          onChange(
            next === "tree"
              ? { kind: next, trunkDiameterCm: Number.NaN, notes }
              : next === "bolts"
                ? { kind: next, boltCount: 2, boltSizeMm: Number.NaN, notes }
                : { kind: next, notes },
          );
        }}
      />
      {kind === "tree" ? <QuantityField name={`anchors.${side}.trunkDiameterCm`} label={`${title} trunk diameter (cm)`} kind="plain" /> : null}
      {kind === "bolts" ? (
        <Pair>
          <QuantityField name={`anchors.${side}.boltCount`} label={`${title} number of bolts`} kind="plain" />
          <QuantityField name={`anchors.${side}.boltSizeMm`} label={`${title} bolt diameter (mm)`} kind="plain" />
        </Pair>
      ) : null}
      <TextField
        name={`anchors.${side}.notes`}
        label={`${title} notes`}
        multiline
        hint="What it is, its condition, how it is protected, what to check before rigging."
      />
    </Panel>
  );
}

export const EMPTY_SITE: SiteInput = {
  name: "",
  accessNotes: "",
  spanM: Number.NaN,
  heightDifferenceM: 0,
  measuredBy: "laser",
  uncertaintyM: Number.NaN,
  ground: { kind: "none" },
  anchors: { a: { kind: "tree", trunkDiameterCm: Number.NaN, notes: "" }, b: { kind: "tree", trunkDiameterCm: Number.NaN, notes: "" } },
  coordinates: null,
};

/** A site's form: the span and how it was measured, the ground under the line, both anchors and where it is. */
export function SiteForm({ units, site }: { units: UnitSystem; site?: { id: string; values: Site } }) {
  const router = useRouter();
  const problems = useMemo(() => createProblemStore(), []);
  const settings = useMemo(() => ({ units, problems, schemaMessages: "sentence" as const }), [units, problems]);
  const { form, submit, formError } = useApiForm<SiteInput, Site>(SiteSchema, {
    url: site ? `/api/sites/${site.id}` : "/api/sites",
    method: site ? "PATCH" : "POST",
    defaultValues: site?.values ?? EMPTY_SITE,
    onSuccess: (body) => {
      router.push(`/sites/${(body.site as { id: string }).id}`);
      router.refresh();
    },
  });
  return (
    <FormSettingsProvider value={settings}>
      <FormProvider {...form}>
        <form noValidate onSubmit={submit} className="max-w-3xl space-y-5">
          <Panel title="The site">
            <TextField name="name" label="Site name" />
            <TextField name="accessNotes" label="Access notes" multiline hint="How to get there, where to park, permissions, seasonal closures." />
            <Pair>
              <QuantityField name="coordinates.latitude" label="Latitude (°, optional)" kind="plain" optional />
              <QuantityField name="coordinates.longitude" label="Longitude (°, optional)" kind="plain" optional />
            </Pair>
          </Panel>
          <Panel title="Span">
            <Pair>
              <QuantityField name="spanM" label="Horizontal span A to B" kind="length" />
              <QuantityField name="heightDifferenceM" label="Height of B above A" kind="length" hint="Negative when B is lower than A." />
              <ChoiceField
                name="measuredBy"
                label="How the span was measured"
                options={MEASUREMENT_METHODS.map((m) => ({ value: m, label: MEASUREMENT_LABELS[m] }))}
              />
              <QuantityField name="uncertaintyM" label="Span uncertainty, ±" kind="length" />
            </Pair>
          </Panel>
          <GroundFields />
          <AnchorFields side="a" />
          <AnchorFields side="b" />
          <FormError message={formError} />
          <Button type="submit" disabled={form.formState.isSubmitting}>
            {site ? "Save the site" : "Add the site"}
          </Button>
        </form>
      </FormProvider>
    </FormSettingsProvider>
  );
}
