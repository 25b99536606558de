"use client";

import type { ReactNode } from "react";
import { useController, useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import { COMPONENT_CATEGORIES, type RigInputDraft, type SlipResult } from "@/physics";
import { formatCapacity } from "@/lib/rig-form/format";
import { ChoiceField, GroupProblem, QuantityField, TextField } from "./rig-fields";
import { useRigFormSettings } from "./rig-form-context";

function Section({ title, children, problem }: { title: string; children: ReactNode; problem?: string }) {
  return (
    <fieldset className="min-w-0 space-y-4 rounded-panel border border-ink-200 bg-white p-4 shadow-panel">
      <legend className="px-1 text-lg font-semibold text-ink-900">{title}</legend>
      {problem ? <GroupProblem name={problem} /> : null}
      {children}
    </fieldset>
  );
}

const Pair = ({ children }: { children: ReactNode }) => <div className="grid gap-4 sm:grid-cols-2">{children}</div>;

/** A row of a list the rigger edits (stretch points, stages, components, slip results), with its remove button. */
function Row({ children, onRemove, removeLabel, canRemove }: { children: ReactNode; onRemove: () => void; removeLabel: string; canRemove: boolean }) {
  return (
    <div className="space-y-3 rounded-control border border-ink-200 bg-ink-50 p-3">
      <div className="grid gap-3 sm:grid-cols-2">{children}</div>
      <div className="flex justify-end">
        <Button tone="secondary" onClick={onRemove} disabled={!canRemove} aria-label={removeLabel}>
          Remove
        </Button>
      </div>
    </div>
  );
}

function SpanFields() {
  return (
    <Section title="Span">
      <TextField name="name" label="Rig name" />
      <Pair>
        <QuantityField name="spanM" label="Horizontal span A to B" kind="length" />
        <QuantityField name="heightDifferenceM" label="Height of B above A" kind="length" hint="Negative when B is lower than A." />
      </Pair>
    </Section>
  );
}

function StretchPoints() {
  const points = useFieldArray<RigInputDraft, "mainline.stretchPoints">({ name: "mainline.stretchPoints" });
  return (
    <div className="space-y-3">
      <h3 className="font-semibold">Stretch points, as measured (the first at 0, 0)</h3>
      <GroupProblem name="mainline.stretchPoints" />
      <GroupProblem name="mainline.stretchPoints.0" />
      {points.fields.map((point, i) => (
        <Row key={point.id} onRemove={() => points.remove(i)} removeLabel={`Remove stretch point ${i + 1}`} canRemove={points.fields.length > 2}>
          <QuantityField name={`mainline.stretchPoints.${i}.tensionKN`} label={`Point ${i + 1} tension`} kind="stretchTension" />
          <QuantityField name={`mainline.stretchPoints.${i}.elongationPct`} label={`Point ${i + 1} elongation (%)`} kind="plain" />
        </Row>
      ))}
      <Button tone="secondary" onClick={() => points.append({ tensionKN: Number.NaN, elongationPct: Number.NaN })}>
        Add a stretch point
      </Button>
    </div>
  );
}

function BackupFields() {
  const { setValue, getValues } = useFormContext<RigInputDraft>();
  const backup = useWatch<RigInputDraft, "backup">({ name: "backup" });
  return (
    <div className="space-y-4">
      <label className="flex min-h-target items-center gap-3 font-semibold">
        <input
          type="checkbox"
          className="h-6 w-6"
          checked={backup !== undefined}
          onChange={(event) => {
            const { mainline } = getValues();
            setValue(
              "backup",
              event.target.checked
                ? { name: `${mainline.name} backup`, massPerMetreKg: mainline.massPerMetreKg, mbsN: mainline.mbsN, ridesAlong: true }
                : undefined,
              {
                shouldValidate: true,
              },
            );
          }}
        />
        There is a backup webbing
      </label>
      {backup !== undefined ? (
        <>
          <TextField name="backup.name" label="Backup webbing" />
          <Pair>
            <QuantityField name="backup.massPerMetreKg" label="Backup mass per metre" kind="massPerLength" />
            <QuantityField name="backup.mbsN" label="Backup MBS" kind="force" />
          </Pair>
          <BooleanField name="backup.ridesAlong" label="The backup rides along the mainline (adds its weight)" />
        </>
      ) : null}
    </div>
  );
}

function BooleanField({ name, label }: { name: "backup.ridesAlong"; label: string }) {
  const { register } = useFormContext<RigInputDraft>();
  return (
    <label className="flex min-h-target items-center gap-3">
      <input type="checkbox" className="h-6 w-6" {...register(name)} />
      {label}
    </label>
  );
}

function MainlineFields() {
  return (
    <Section title="Mainline and backup">
      <TextField name="mainline.name" label="Mainline webbing" />
      <Pair>
        <QuantityField name="mainline.massPerMetreKg" label="Mainline mass per metre" kind="massPerLength" />
        <QuantityField name="mainline.mbsN" label="Mainline MBS" kind="force" />
      </Pair>
      <StretchPoints />
      <BackupFields />
    </Section>
  );
}

const ANCHOR_CHOICES = [
  { value: "a", label: "Anchor A" },
  { value: "b", label: "Anchor B" },
];

function PretensionAndWalker() {
  return (
    <>
      <Section title="Pretension">
        <Pair>
          <QuantityField name="pretension.forceN" label="Pretension, nobody on the line" kind="force" />
          <ChoiceField name="pretension.readAt" label="Read at" options={ANCHOR_CHOICES} />
        </Pair>
      </Section>
      <Section title="Walker" problem="walker">
        <Pair>
          <QuantityField name="walker.massKg" label="Walker mass" kind="mass" />
          <QuantityField name="walker.positionFraction" label="Walker position from A, share of the span" kind="fraction" optional hint="Blank: mid-span." />
        </Pair>
      </Section>
      <Section title="Leash fall" problem="leashFall">
        <Pair>
          <QuantityField name="leashFall.leashLengthM" label="Leash length" kind="length" optional />
          <QuantityField name="leashFall.harnessHeightM" label="Harness height above the line" kind="length" optional />
          <QuantityField name="leashFall.fallHeightM" label="Free-fall height" kind="length" optional hint="Blank: leash length + harness height." />
          <QuantityField
            name="leashFall.positionFraction"
            label="Fall position from A, share of the span"
            kind="fraction"
            optional
            hint="Blank: at the walker."
          />
        </Pair>
      </Section>
    </>
  );
}

function BrakeLocationField() {
  const stages = useWatch<RigInputDraft, "tensioning.stages">({ name: "tensioning.stages" });
  const {
    field: { ref, onChange, onBlur, value: brake },
  } = useController<RigInputDraft, "tensioning.brake">({ name: "tensioning.brake" });
  const value = brake.on === "tail" ? "tail" : String(brake.stage);
  const options = [
    { value: "tail", label: "On the crew's tail (after the last stage)" },
    ...stages.slice(0, -1).map((_, i) => ({ value: String(i), label: `On the tail of stage ${i + 1}` })),
  ];
  return (
    <Select
      label="Where the brake holds"
      options={options}
      value={value}
      name="tensioning.brake"
      ref={ref}
      onBlur={onBlur}
      onChange={(event) => onChange(event.target.value === "tail" ? { on: "tail" } : { on: "stage", stage: Number(event.target.value) })}
      hint="The brake holds the line tension over the ideal advantage between it and the line."
    />
  );
}

function TensioningFields() {
  const stages = useFieldArray<RigInputDraft, "tensioning.stages">({ name: "tensioning.stages" });
  return (
    <Section title="Tensioning" problem="tensioning.stages">
      <p className="text-sm text-ink-600">Stage 1 pulls on the line; each further stage hauls the tail of the one before (stages multiply).</p>
      {stages.fields.map((stage, i) => (
        <Row key={stage.id} onRemove={() => stages.remove(i)} removeLabel={`Remove stage ${i + 1}`} canRemove={stages.fields.length > 1}>
          <QuantityField name={`tensioning.stages.${i}.ratio`} label={`Stage ${i + 1}, n of n:1`} kind="plain" />
        </Row>
      ))}
      <Button tone="secondary" onClick={() => stages.append({ ratio: 2 })}>
        Add a stage
      </Button>
      <Pair>
        <QuantityField name="tensioning.sheaveEfficiency" label="Sheave efficiency" kind="fraction" />
        <QuantityField name="tensioning.pullPerPersonN" label="Pull per person" kind="force" />
      </Pair>
      <BrakeLocationField />
      <GroupProblem name="tensioning.brake.stage" />
    </Section>
  );
}

const RESULT_LABELS: Record<SlipResult["result"], string> = { slipped: "Slipped at", held: "Held to (no slip)" };
const RESULT_CHOICES = Object.entries(RESULT_LABELS).map(([value, label]) => ({ value, label }));

/** The crew's slip results, read-only: they come from the slip bench and count in every brake check. */
function CrewBenchResults() {
  const { crewBench, units } = useRigFormSettings();
  return (
    <table className="w-full text-left text-sm">
      <caption className="text-left font-semibold text-ink-900">From the crew&apos;s slip bench</caption>
      <thead>
        <tr className="border-b border-ink-200">
          <th scope="col" className="py-1 pr-2">
            Device
          </th>
          <th scope="col" className="py-1 pr-2">
            Rope (mm)
          </th>
          <th scope="col" className="py-1 pr-2">
            Outcome
          </th>
          <th scope="col" className="py-1">
            Force
          </th>
        </tr>
      </thead>
      <tbody>
        {crewBench.map((r, i) => (
          <tr key={i} className="border-b border-ink-100">
            <td className="py-1 pr-2">{r.device}</td>
            <td className="py-1 pr-2 tabular-nums">{r.ropeDiameterMm}</td>
            <td className="py-1 pr-2">{RESULT_LABELS[r.result]}</td>
            <td className="py-1 tabular-nums">{formatCapacity(r.forceN, units)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function BrakeFields() {
  const { getValues } = useFormContext<RigInputDraft>();
  const { crewBench } = useRigFormSettings();
  const results = useFieldArray<RigInputDraft, "slipBench">({ name: "slipBench" });
  const devices = [...new Set(crewBench.map((r) => r.device))].sort((a, b) => a.localeCompare(b));
  const diameters = [...new Set(crewBench.map((r) => r.ropeDiameterMm))].sort((a, b) => a - b).map(String);
  return (
    <Section title="Brake" problem="slipBench">
      <Pair>
        <TextField
          name="brake.device"
          label="Brake device"
          suggestions={devices}
          hint={devices.length ? "Offers the devices on the crew's slip bench." : undefined}
        />
        <QuantityField
          name="brake.ropeDiameterMm"
          label="Rope diameter (mm)"
          kind="plain"
          suggestions={diameters}
          hint={diameters.length ? "Offers the diameters on the crew's slip bench; another diameter is untested." : undefined}
        />
      </Pair>
      <p className="text-sm text-ink-600">
        Only results for the same device and rope diameter count. &quot;Held to&quot; is a lower bound: the test stopped without a slip.
      </p>
      {crewBench.length ? <CrewBenchResults /> : null}
      <h3 className="font-semibold">{crewBench.length ? "Further slip results, typed here (not on the crew's bench)" : "Slip results from the bench"}</h3>
      {results.fields.map((result, i) => (
        <Row key={result.id} onRemove={() => results.remove(i)} removeLabel={`Remove slip result ${i + 1}`} canRemove>
          <TextField name={`slipBench.${i}.device`} label={`Result ${i + 1} device`} />
          <QuantityField name={`slipBench.${i}.ropeDiameterMm`} label={`Result ${i + 1} rope diameter (mm)`} kind="plain" />
          <ChoiceField name={`slipBench.${i}.result`} label={`Result ${i + 1} outcome`} options={RESULT_CHOICES} />
          <QuantityField name={`slipBench.${i}.forceN`} label={`Result ${i + 1} force`} kind="force" />
        </Row>
      ))}
      <Button
        tone="secondary"
        onClick={() => {
          const { brake } = getValues();
          results.append({ device: brake.device, ropeDiameterMm: brake.ropeDiameterMm, result: "slipped", forceN: Number.NaN });
        }}
      >
        Add a slip result
      </Button>
    </Section>
  );
}

const LAYOUT_CHOICES = [
  { value: "single", label: "Single point" },
  { value: "bridle", label: "Two-leg bridle" },
];
const CATEGORY_CHOICES = COMPONENT_CATEGORIES.map((c) => ({ value: c, label: c[0].toUpperCase() + c.slice(1) }));
const CARRIES_CHOICES = [
  { value: "line", label: "The line tension (master point)" },
  { value: "leg", label: "One leg (or the single point)" },
];
// A common bridle angle to start from when a rigger switches to a bridle (common practice, no source).
const STARTING_BRIDLE_ANGLE = 60;

function AnchorFields({ side }: { side: "a" | "b" }) {
  const title = `Anchor ${side.toUpperCase()}`;
  const {
    field: { ref, onChange, onBlur, value: layout },
  } = useController<RigInputDraft, `anchors.${typeof side}.layout`>({ name: `anchors.${side}.layout` });
  const components = useFieldArray<RigInputDraft, `anchors.${typeof side}.components`>({ name: `anchors.${side}.components` });
  return (
    <Section title={title} problem={`anchors.${side}.layout`}>
      <Pair>
        <Select
          label={`${title} layout`}
          options={LAYOUT_CHOICES}
          value={layout.kind}
          name={`anchors.${side}.layout`}
          ref={ref}
          onBlur={onBlur}
          onChange={(event) => onChange(event.target.value === "bridle" ? { kind: "bridle", includedAngleDeg: STARTING_BRIDLE_ANGLE } : { kind: "single" })}
        />
        {layout.kind === "bridle" ? (
          <QuantityField name={`anchors.${side}.layout.includedAngleDeg`} label={`${title} bridle included angle (°)`} kind="plain" />
        ) : null}
      </Pair>
      <h3 className="font-semibold">Components in the load path</h3>
      {components.fields.map((component, i) => (
        <Row key={component.id} onRemove={() => components.remove(i)} removeLabel={`Remove ${title} component ${i + 1}`} canRemove>
          <TextField name={`anchors.${side}.components.${i}.name`} label={`${title} component ${i + 1}`} />
          <ChoiceField name={`anchors.${side}.components.${i}.category`} label={`Component ${i + 1} kind`} options={CATEGORY_CHOICES} />
          <QuantityField name={`anchors.${side}.components.${i}.mbsN`} label={`Component ${i + 1} MBS`} kind="force" />
          <ChoiceField name={`anchors.${side}.components.${i}.carries`} label={`Component ${i + 1} carries`} options={CARRIES_CHOICES} />
        </Row>
      ))}
      <Button tone="secondary" onClick={() => components.append({ name: "", category: "connector", mbsN: Number.NaN, carries: "line" })}>
        Add a component to {title}
      </Button>
    </Section>
  );
}

const MINIMUM_LABELS = { webbing: "Webbing", connector: "Connectors", sling: "Slings", anchor: "Anchors", other: "Other gear (rope, pulleys, brake)" } as const;

function MinimumFactorFields() {
  return (
    <Section title="Minimum safety factors">
      <p className="text-sm text-ink-600">From your crew&apos;s settings; change them here only to see what a stricter minimum would ask.</p>
      <div className="grid gap-4 sm:grid-cols-2">
        {(Object.keys(MINIMUM_LABELS) as (keyof typeof MINIMUM_LABELS)[]).map((key) => (
          <QuantityField key={key} name={`minimumSafetyFactors.${key}`} label={`Minimum for ${MINIMUM_LABELS[key].toLowerCase()}`} kind="plain" />
        ))}
      </div>
    </Section>
  );
}

/** Every input of a rig, section by section, in the crew's units. */
export function RigInputForm() {
  return (
    <div className="space-y-5">
      <SpanFields />
      <MainlineFields />
      <PretensionAndWalker />
      <TensioningFields />
      <BrakeFields />
      <AnchorFields side="a" />
      <AnchorFields side="b" />
      <MinimumFactorFields />
    </div>
  );
}
