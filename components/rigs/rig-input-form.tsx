"use client";

import { memo, type ReactNode } from "react";
import { useController, useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import { ChoiceField, GroupProblem, QuantityCell, QuantityField, TextField } from "@/components/forms/fields";
import { useFieldProblem, useUnits } from "@/components/forms/form-settings";
import { COMPONENT_CATEGORIES, capacityText } from "@/physics";
import type { QuantityKind } from "@/lib/rig-form/quantities";
import { formatDistance } from "@/lib/rig-form/format";
import { kindOf, labelOf } from "@/lib/planner/fields";
import { PICK_KINDS, prepareRigInput, type KitModel } from "@/lib/planner/kit";
import { valueAt } from "@/lib/planner/differences";
import { GEAR_KIND_LABELS, type GearKind } from "@/lib/validations/kit";
import { MEASUREMENT_LABELS } from "@/lib/validations/sites";
import { SLIP_RESULT_LABELS } from "@/lib/validations/slip-tests";
import { modelById, usePlanner } from "./planner-context";

type Values = Record<string, unknown>;

// The form's lists (stretch points, stages, components, slip results), by a plain path.
const useList = (name: string) => useFieldArray<Record<string, Record<string, unknown>[]>, string>({ name });

/** A section of the form that folds away; open ones show their fields. */
function Section({ title, children, problem, open = true }: { title: string; children: ReactNode; problem?: string; open?: boolean }) {
  return (
    <details open={open} className="group min-w-0 rounded-panel border border-ink-200 bg-white shadow-panel">
      <summary className="flex min-h-target cursor-pointer list-none items-center justify-between gap-2 px-4 py-2 text-lg font-semibold text-ink-900">
        {title}
        <span aria-hidden="true" className="text-ink-500 transition-transform group-open:rotate-90">
          ›
        </span>
      </summary>
      <div className="space-y-4 border-t border-ink-100 p-4">
        {problem ? <GroupProblem name={problem} /> : null}
        {children}
      </div>
    </details>
  );
}

const Pair = ({ children }: { children: ReactNode }) => <div className="grid gap-4 sm:grid-cols-2">{children}</div>;

/** A number field labelled and converted by the one table of the rig's inputs. */
function Quantity({ name, optional, hint, readOnly }: { name: string; optional?: boolean; hint?: ReactNode; readOnly?: boolean }) {
  const units = useUnits();
  return <QuantityField name={name} label={labelOf(name, units)} kind={kindOf(name) as QuantityKind} optional={optional} hint={hint} readOnly={readOnly} />;
}

/** Which Kit model a field names, kept up to date as the form changes. */
function usePicked(name: string): KitModel | undefined {
  const { catalogue } = usePlanner();
  return modelById(catalogue, useWatch<Values>({ name }));
}

const fromKit = (model: KitModel | undefined) => (model ? `From the Kit: ${model.name}.` : undefined);

/**
 * Chooses a model of the crew's Kit for a piece of gear, or none (its figures are typed, and marked so).
 * A pick fills the figures the same way the server will, so the boxes show what is evaluated.
 */
function GearPicker({ name, kinds, fills }: { name: string; kinds: readonly GearKind[]; fills: readonly string[] }) {
  const { catalogue, sites } = usePlanner();
  const { getValues, setValue } = useFormContext<Values>();
  const {
    field: { ref, onChange, onBlur, value },
  } = useController<Values>({ name });
  const problem = useFieldProblem(name, undefined);
  const models = catalogue.models.filter((m) => (kinds as readonly string[]).includes(m.kind));
  const chosen = modelById(catalogue, value);
  const options = [
    { value: "", label: "Not from the Kit: type its figures" },
    ...models.map((m) => ({
      value: m.id,
      label: `${m.name}${kinds.length > 1 ? ` (${m.kind.replace("_", " ")})` : ""}${m.retiredOn ? `, retired ${m.retiredOn}` : ""}`,
      disabled: m.retiredOn !== null && m.id !== value,
    })),
  ];
  return (
    <Select
      label={labelOf(name)}
      options={options}
      name={name}
      ref={ref}
      value={typeof value === "string" ? value : ""}
      onBlur={onBlur}
      error={problem}
      hint={chosen ? undefined : models.length ? "Typed gear is marked as not from the Kit on the rig." : "The Kit has no gear of this kind yet."}
      onChange={(event) => {
        const id = event.target.value || undefined;
        onChange(id);
        if (!id) return;
        const values = getValues();
        const site = sites.find((s) => s.id === values.siteId) ?? null;
        const { input } = prepareRigInput(values, catalogue, site);
        for (const path of fills) setValue(path, valueAt(input, path), { shouldValidate: true });
      }}
    />
  );
}

function SiteFields() {
  const { sites, catalogue } = usePlanner();
  const { getValues, setValue } = useFormContext<Values>();
  const {
    field: { ref, onChange, onBlur, value },
  } = useController<Values>({ name: "siteId" });
  const site = sites.find((s) => s.id === value);
  const units = useUnits();
  return (
    <Section title="Site and span">
      <TextField name="name" label={labelOf("name")} />
      <Select
        label="Site"
        name="siteId"
        ref={ref}
        onBlur={onBlur}
        value={typeof value === "string" ? value : ""}
        options={[{ value: "", label: "No site: type a free span" }, ...sites.map((s) => ({ value: s.id, label: s.name }))]}
        onChange={(event) => {
          const chosen = sites.find((s) => s.id === event.target.value);
          onChange(chosen?.id ?? null);
          if (!chosen) return;
          const { input } = prepareRigInput(getValues(), catalogue, chosen);
          for (const path of ["spanM", "heightDifferenceM"]) setValue(path, valueAt(input, path), { shouldValidate: true });
        }}
        hint={site ? undefined : "A site gives the span, the height difference and the ground under the line."}
      />
      {site ? (
        <p className="text-sm text-ink-700">
          Span measured by {MEASUREMENT_LABELS[site.measuredBy].toLowerCase()}, ±{formatDistance(site.uncertaintyM, units)}.{" "}
          {site.ground.kind === "none" ? "No ground is given for this site." : "The site's ground is drawn on the side view."}
        </p>
      ) : null}
      <Pair>
        <Quantity name="spanM" readOnly={!!site} hint={site ? `From the site ${site.name}.` : undefined} />
        <Quantity name="heightDifferenceM" readOnly={!!site} hint={site ? `From the site ${site.name}.` : "Negative when B is lower than A."} />
      </Pair>
    </Section>
  );
}

/** Stretch points as a compact table: tension and elongation per row, as measured. */
function StretchTable({ line, readOnly }: { line: "mainline" | "backup"; readOnly: boolean }) {
  const name = `${line}.stretchPoints` as const;
  const points = useList(name);
  const title = labelOf(name);
  return (
    <div className="space-y-2">
      <GroupProblem name={name} />
      <GroupProblem name={`${name}.0`} />
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="pb-1 text-left font-semibold text-ink-900">{title}, as measured (the first at 0, 0)</caption>
          <thead>
            <tr className="border-b border-ink-200">
              <th scope="col" className="w-8 py-1 pr-2">
                #
              </th>
              <th scope="col" className="py-1 pr-2">
                Tension
              </th>
              <th scope="col" className="py-1 pr-2">
                Elongation (%)
              </th>
              {readOnly ? null : (
                <th scope="col" className="py-1">
                  <span className="sr-only">Remove</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {points.fields.map((point, i) => (
              <tr key={point.id} className="align-top">
                <td className="py-1 pr-2 tabular-nums text-ink-600">{i + 1}</td>
                <td className="py-1 pr-2">
                  <QuantityCell name={`${name}.${i}.tensionKN`} label={labelOf(`${name}.${i}.tensionKN`)} kind="stretchTension" readOnly={readOnly} />
                </td>
                <td className="py-1 pr-2">
                  <QuantityCell name={`${name}.${i}.elongationPct`} label={labelOf(`${name}.${i}.elongationPct`)} kind="plain" readOnly={readOnly} />
                </td>
                {readOnly ? null : (
                  <td className="py-1">
                    <Button
                      tone="quiet"
                      onClick={() => points.remove(i)}
                      disabled={points.fields.length <= 2}
                      aria-label={`Remove ${labelOf(`${name}.${i}`).toLowerCase()}`}
                    >
                      ✕
                    </Button>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {readOnly ? null : (
        <Button tone="secondary" onClick={() => points.append({ tensionKN: Number.NaN, elongationPct: Number.NaN })}>
          Add a stretch point
        </Button>
      )}
    </div>
  );
}

const LINE_FILLS = (line: string) => [`${line}.name`, `${line}.massPerMetreKg`, `${line}.mbsN`, `${line}.stretchPoints`];

function LineFields({ line }: { line: "mainline" | "backup" }) {
  const model = usePicked(`${line}.modelId`);
  return (
    <>
      <GearPicker name={`${line}.modelId`} kinds={PICK_KINDS[line]} fills={LINE_FILLS(line)} />
      <TextField name={`${line}.name`} label={labelOf(`${line}.name`)} readOnly={!!model} hint={fromKit(model)} />
      <Pair>
        <Quantity name={`${line}.massPerMetreKg`} readOnly={!!model} />
        <Quantity name={`${line}.mbsN`} readOnly={!!model} />
      </Pair>
      <StretchTable line={line} readOnly={!!model} />
    </>
  );
}

function BackupFields() {
  const { setValue, getValues, register } = useFormContext<Values>();
  const backup = useWatch<Values>({ name: "backup" });
  return (
    <div className="space-y-4 border-t border-ink-100 pt-4">
      <label className="flex min-h-target items-center gap-3 font-semibold">
        <input
          type="checkbox"
          className="h-6 w-6"
          checked={backup !== undefined}
          onChange={(event) => {
            const mainline = getValues("mainline") as Record<string, unknown>;
            const copy = {
              name: `${mainline.name} backup`,
              massPerMetreKg: mainline.massPerMetreKg,
              mbsN: mainline.mbsN,
              ridesAlong: true,
              modelId: mainline.modelId,
              stretchPoints: structuredClone(mainline.stretchPoints),
            };
            setValue("backup", event.target.checked ? copy : undefined, { shouldValidate: true });
          }}
        />
        There is a backup
      </label>
      {backup !== undefined ? (
        <>
          <LineFields line="backup" />
          <Quantity
            name="backup.slackM"
            optional
            hint="Its unstretched length over the mainline's. With its stretch points, the engine works out its catch if the mainline fails."
          />
          <label className="flex min-h-target items-center gap-3">
            <input type="checkbox" className="h-6 w-6" {...register("backup.ridesAlong")} />
            {labelOf("backup.ridesAlong")} (adds its weight)
          </label>
        </>
      ) : null}
    </div>
  );
}

const ANCHOR_CHOICES = [
  { value: "a", label: "Anchor A" },
  { value: "b", label: "Anchor B" },
];

function PretensionAndWalker() {
  return (
    <>
      <Section title="Pretension and walker" problem="walker">
        <Pair>
          <Quantity name="pretension.forceN" />
          <ChoiceField name="pretension.readAt" label={labelOf("pretension.readAt")} options={ANCHOR_CHOICES} />
          <Quantity name="walker.massKg" />
          <Quantity name="walker.positionFraction" optional hint="Blank: mid-span. Drag the walker on the side view to move it." />
        </Pair>
      </Section>
      <Section title="Leash fall" problem="leashFall" open={false}>
        <Pair>
          <Quantity name="leashFall.leashLengthM" optional />
          <Quantity name="leashFall.harnessHeightM" optional />
          <Quantity name="leashFall.fallHeightM" optional hint="Blank: leash length + harness height." />
          <Quantity name="leashFall.positionFraction" optional hint="Blank: at the walker." />
          <Quantity name="leashFall.hangBelowTieInM" optional hint="Blank: 1.2 m, an adult's feet below the tie-in (a value from memory)." />
        </Pair>
      </Section>
    </>
  );
}

function BrakeLocationField() {
  const stages = useWatch<Values>({ name: "tensioning.stages" }) as unknown[];
  const {
    field: { ref, onChange, onBlur, value },
  } = useController<Values>({ name: "tensioning.brake" });
  const brake = value as { on: "tail" } | { on: "stage"; stage: number };
  const options = [
    { value: "tail", label: "On the crew's tail (after the last stage)" },
    ...stages.slice(0, -1).map((_, i) => ({ value: String(i), label: `On the tail of stage ${i + 1}` })),
  ];
  return (
    <Select
      label={labelOf("tensioning.brake")}
      options={options}
      value={brake.on === "tail" ? "tail" : String(brake.stage)}
      name="tensioning.brake"
      ref={ref}
      onBlur={onBlur}
      onChange={(event) => onChange(event.target.value === "tail" ? { on: "tail" } : { on: "stage", stage: Number(event.target.value) })}
      hint="The brake holds the line tension over the ideal advantage between it and the line."
    />
  );
}

function TensioningFields() {
  const stages = useList("tensioning.stages");
  const pulley = usePicked("tensioning.pulleyModelId");
  return (
    <Section title="Tensioning" problem="tensioning.stages" open={false}>
      <p className="text-sm text-ink-600">Stage 1 pulls on the line; each further stage hauls the tail of the one before (stages multiply).</p>
      <div className="flex flex-wrap items-end gap-3">
        {stages.fields.map((stage, i) => (
          <div key={stage.id} className="flex items-end gap-1">
            <div className="w-32">
              <Quantity name={`tensioning.stages.${i}.ratio`} />
            </div>
            <Button tone="quiet" onClick={() => stages.remove(i)} disabled={stages.fields.length <= 1} aria-label={`Remove stage ${i + 1}`}>
              ✕
            </Button>
          </div>
        ))}
        <Button tone="secondary" onClick={() => stages.append({ ratio: 2 })}>
          Add a stage
        </Button>
      </div>
      <GearPicker name="tensioning.pulleyModelId" kinds={PICK_KINDS.pulley} fills={["tensioning.sheaveEfficiency"]} />
      <Pair>
        <Quantity name="tensioning.sheaveEfficiency" readOnly={!!pulley} hint={fromKit(pulley)} />
        <Quantity name="tensioning.pullPerPersonN" />
      </Pair>
      <BrakeLocationField />
      <GroupProblem name="tensioning.brake.stage" />
    </Section>
  );
}

const RESULT_CHOICES = Object.entries(SLIP_RESULT_LABELS).map(([value, label]) => ({ value, label }));

/** The slip tests the Kit's bench holds for the picked device: read-only, they count in the brake check. */
function BenchResults({ device }: { device: KitModel }) {
  const { catalogue } = usePlanner();
  const units = useUnits();
  const tests = catalogue.bench.filter((t) => t.deviceId === device.id).sort((a, b) => a.ropeDiameterMm - b.ropeDiameterMm || a.forceN - b.forceN);
  if (tests.length === 0) return <p className="text-sm text-caution-800">The slip bench has no tests of {device.name} yet: the brake check says untested.</p>;
  return (
    <table className="w-full text-left text-sm">
      <caption className="text-left font-semibold text-ink-900">Slip tests of {device.name} on the crew&apos;s bench</caption>
      <thead>
        <tr className="border-b border-ink-200">
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
        {tests.map((t) => (
          <tr key={t.id} className="border-b border-ink-100">
            <td className="py-1 pr-2 tabular-nums">{t.ropeDiameterMm}</td>
            <td className="py-1 pr-2">{SLIP_RESULT_LABELS[t.result]}</td>
            <td className="py-1 tabular-nums">{capacityText(t.forceN, units)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function TypedSlipResults() {
  const { getValues } = useFormContext<Values>();
  const results = useList("slipBench");
  return (
    <div className="space-y-3">
      <h3 className="font-semibold">Slip results typed here (this brake is not from the Kit)</h3>
      {results.fields.map((result, i) => (
        <div key={result.id} className="space-y-3 rounded-control border border-ink-200 bg-ink-50 p-3">
          <Pair>
            <TextField name={`slipBench.${i}.device`} label={labelOf(`slipBench.${i}.device`)} />
            <Quantity name={`slipBench.${i}.ropeDiameterMm`} />
            <ChoiceField name={`slipBench.${i}.result`} label={labelOf(`slipBench.${i}.result`)} options={RESULT_CHOICES} />
            <Quantity name={`slipBench.${i}.forceN`} />
          </Pair>
          <div className="flex justify-end">
            <Button tone="secondary" onClick={() => results.remove(i)} aria-label={`Remove ${labelOf(`slipBench.${i}`).toLowerCase()}`}>
              Remove
            </Button>
          </div>
        </div>
      ))}
      <Button
        tone="secondary"
        onClick={() => {
          const brake = getValues("brake") as { device: string; ropeDiameterMm: number };
          results.append({ device: brake.device, ropeDiameterMm: brake.ropeDiameterMm, result: "slipped", forceN: Number.NaN });
        }}
      >
        Add a slip result
      </Button>
    </div>
  );
}

function BrakeFields() {
  const device = usePicked("brake.modelId");
  const rope = usePicked("brake.ropeModelId");
  return (
    <Section title="Brake" problem="slipBench" open={false}>
      <GearPicker name="brake.modelId" kinds={PICK_KINDS.brake} fills={["brake.device"]} />
      <TextField name="brake.device" label={labelOf("brake.device")} readOnly={!!device} hint={fromKit(device)} />
      <Pair>
        <GearPicker name="brake.ropeModelId" kinds={PICK_KINDS.brakeRope} fills={["brake.ropeDiameterMm"]} />
        <Quantity name="brake.ropeDiameterMm" readOnly={!!rope} hint={fromKit(rope)} />
      </Pair>
      <p className="text-sm text-ink-600">
        Only tests of the same device on the same rope diameter count. &quot;Held to&quot; is a lower bound: the test stopped without a slip.
      </p>
      {device ? <BenchResults device={device} /> : <TypedSlipResults />}
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

function ComponentRow({ side, index, onRemove }: { side: "a" | "b"; index: number; onRemove: () => void }) {
  const path = `anchors.${side}.components.${index}`;
  const model = usePicked(`${path}.modelId`);
  return (
    <div className="space-y-3 rounded-control border border-ink-200 bg-ink-50 p-3">
      <GearPicker name={`${path}.modelId`} kinds={PICK_KINDS.component} fills={[`${path}.name`, `${path}.category`, `${path}.mbsN`]} />
      <Pair>
        <TextField name={`${path}.name`} label={labelOf(`${path}.name`)} readOnly={!!model} hint={fromKit(model)} />
        {model ? (
          <p className="text-sm">
            <span className="block font-semibold text-ink-800">{labelOf(`${path}.category`)}</span>
            {GEAR_KIND_LABELS[model.kind]}
          </p>
        ) : (
          <ChoiceField name={`${path}.category`} label={labelOf(`${path}.category`)} options={CATEGORY_CHOICES} />
        )}
        <Quantity name={`${path}.mbsN`} readOnly={!!model} />
        <ChoiceField name={`${path}.carries`} label={labelOf(`${path}.carries`)} options={CARRIES_CHOICES} />
      </Pair>
      <div className="flex justify-end">
        <Button tone="secondary" onClick={onRemove} aria-label={`Remove ${labelOf(path).toLowerCase()}`}>
          Remove
        </Button>
      </div>
    </div>
  );
}

function AnchorFields({ side }: { side: "a" | "b" }) {
  const title = `Anchor ${side.toUpperCase()}`;
  const {
    field: { ref, onChange, onBlur, value },
  } = useController<Values>({ name: `anchors.${side}.layout` });
  const layout = value as { kind: "single" } | { kind: "bridle"; includedAngleDeg: number };
  const components = useList(`anchors.${side}.components`);
  return (
    <Section title={title} problem={`anchors.${side}.layout`} open={false}>
      <Pair>
        <Select
          label={labelOf(`anchors.${side}.layout`)}
          options={LAYOUT_CHOICES}
          value={layout.kind}
          name={`anchors.${side}.layout`}
          ref={ref}
          onBlur={onBlur}
          onChange={(event) => onChange(event.target.value === "bridle" ? { kind: "bridle", includedAngleDeg: STARTING_BRIDLE_ANGLE } : { kind: "single" })}
        />
        {layout.kind === "bridle" ? <Quantity name={`anchors.${side}.layout.includedAngleDeg`} /> : null}
      </Pair>
      <h3 className="font-semibold">Components in the load path</h3>
      {components.fields.map((component, i) => (
        <ComponentRow key={component.id} side={side} index={i} onRemove={() => components.remove(i)} />
      ))}
      <Button tone="secondary" onClick={() => components.append({ name: "", category: "connector", mbsN: Number.NaN, carries: "line" })}>
        Add a component to {title}
      </Button>
    </Section>
  );
}

const MINIMUM_KEYS = ["webbing", "connector", "sling", "anchor", "other"] as const;

function MinimumFactorFields() {
  return (
    <Section title="Crew minimums" open={false}>
      <p className="text-sm text-ink-600">From your crew&apos;s settings; change them here only to see what a stricter minimum would ask.</p>
      <div className="grid gap-4 sm:grid-cols-2">
        {MINIMUM_KEYS.map((key) => (
          <Quantity key={key} name={`minimumSafetyFactors.${key}`} />
        ))}
        <Quantity name="minimumBrakeMargin" />
        <Quantity name="minimumClearanceM" />
      </div>
    </Section>
  );
}

/**
 * Every input of a rig, section by section, in the crew's units. It takes no props and reads the form
 * through its context, so a new evaluation (or a dragged walker) never re-renders the whole form.
 */
export const RigInputForm = memo(function RigInputForm() {
  const { editable } = usePlanner();
  return (
    <fieldset disabled={!editable} className="min-w-0 space-y-4">
      <legend className="sr-only">Rig inputs</legend>
      <SiteFields />
      <Section title="Mainline and backup">
        <LineFields line="mainline" />
        <BackupFields />
      </Section>
      <PretensionAndWalker />
      <TensioningFields />
      <BrakeFields />
      <AnchorFields side="a" />
      <AnchorFields side="b" />
      <MinimumFactorFields />
    </fieldset>
  );
});
