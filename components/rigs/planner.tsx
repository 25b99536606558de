"use client";

import { useCallback, useDeferredValue, useLayoutEffect, useMemo, useState, useSyncExternalStore, type ReactNode } from "react";
import dynamic from "next/dynamic";
import { FormProvider, useForm, useWatch, type UseFormReturn } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { RigInputSchema } from "@/physics";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import type { KitCatalogue, KitChange, SiteSnapshot } from "@/lib/planner/kit";
import { createProblemStore, FormSettingsProvider, type ProblemStore } from "@/components/forms/form-settings";
import { labelOf } from "@/lib/planner/fields";
import { evaluatePlanner, fieldProblemsOf, type Evaluation } from "./evaluation";
import { PlannerProvider } from "./planner-context";
import { RigInputForm } from "./rig-input-form";
import { RigSummary } from "./rig-summary";
import { RigDetails } from "./rig-details";
import { WALKER_RANGE } from "./line-diagram";
import { SaveBar, type SavedRevision, type ServerRefusal } from "./save-bar";
import { ServerCheck } from "./server-check";

// Konva draws on a canvas and needs the browser: never rendered on the server.
const LineDiagram = dynamic(() => import("./line-diagram").then((m) => m.LineDiagram), {
  ssr: false,
  loading: () => <div className="h-[230px] animate-pulse rounded-panel bg-ink-100" aria-hidden="true" />,
});

type Values = Record<string, unknown>;

export type PlannerMode = "check" | "new" | "edit" | "view";

export interface PlannerProps {
  /** "check": try a line without saving; "new": a rig not saved yet; "edit": a saved rig a rigger changes; "view": read only. */
  mode: PlannerMode;
  units: UnitSystem;
  catalogue: KitCatalogue;
  sites: readonly SiteSnapshot[];
  /** The form's first values: the engine's input with the Kit's model ids, and the site's id. */
  start: Values;
  /** The saved revision the form starts from (edit and view). */
  revision?: SavedRevision & { rigId: string };
  /** Kit models the revision used whose figures have changed since it was saved. */
  kitChanges?: readonly KitChange[];
}

// Where the walker stands, as a share of the span: the one input the diagram and the slider change.
const setWalker = (form: UseFormReturn<Values>, fraction: number) =>
  form.setValue("walker.positionFraction", fraction as never, { shouldDirty: true, shouldValidate: true });

const noSubscription = () => () => undefined;

/** False while rendering on the server and hydrating, true once the page runs in the browser. */
function useInBrowser(): boolean {
  return useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
}

/** The walker slider that mirrors the diagram: the same position, for those who prefer a slider. */
function WalkerSlider({ form, fraction }: { form: UseFormReturn<Values>; fraction: number }) {
  return (
    <label className="block text-sm font-semibold text-ink-800">
      Walker position from A: {Math.round(fraction * 1000) / 10} % of the span
      <input
        type="range"
        className="mt-1 block h-target w-full accent-spruce-700"
        min={WALKER_RANGE.min * 100}
        max={WALKER_RANGE.max * 100}
        step={0.5}
        value={fraction * 100}
        onChange={(event) => {
          performance.mark("walker-input");
          setWalker(form, Number(event.target.value) / 100);
        }}
      />
    </label>
  );
}

function KitChangeNotice({ changes }: { changes: readonly KitChange[] }) {
  if (!changes.length) return null;
  const words = { changed: "its figures in the Kit have changed", retired: "it has been retired", gone: "it is no longer in the Kit" };
  return (
    <div role="note" className="rounded-panel border-2 border-caution-500 bg-caution-100 p-3 text-caution-800">
      <p className="font-semibold">The Kit has changed since this revision was saved.</p>
      <ul className="list-disc pl-5">
        {changes.map((c) => (
          <li key={c.field}>
            {labelOf(c.field)}: {c.name} — {words[c.change]}.
          </li>
        ))}
      </ul>
      <p>The figures below use the Kit as it is now; the saved revision keeps its own. Saving makes a new revision with today&apos;s figures.</p>
    </div>
  );
}

/**
 * The live half of the planner: watches the form, evaluates it as the server will, publishes the
 * problems to the fields, and lays out the diagram, the headline figures (in view while editing, on a
 * phone too), the form and the details. The form arrives as a ready element, so a new evaluation
 * re-renders the figures but never the form's fields.
 */
function Workbench({
  props,
  form,
  problems,
  formElement,
}: {
  props: PlannerProps;
  form: UseFormReturn<Values>;
  problems: ProblemStore;
  formElement: ReactNode;
}) {
  const { mode, units, catalogue, sites } = props;
  const inBrowser = useInBrowser();
  const values = useWatch({ control: form.control }) as Values;
  const valuesJson = useMemo(() => JSON.stringify(values), [values]);
  const site = sites.find((s) => s.id === values.siteId) ?? null;
  const evaluation: Evaluation = useMemo(() => evaluatePlanner(JSON.parse(valuesJson), catalogue, site, units), [valuesJson, catalogue, site, units]);
  const [refusal, setRefusal] = useState<ServerRefusal | null>(null);
  // The server's refusal stands beside its fields until the input it refused changes.
  useLayoutEffect(() => {
    const serverProblems = refusal && refusal.valuesJson === valuesJson ? refusal.fieldErrors : {};
    problems.publish({ ...fieldProblemsOf(evaluation), ...serverProblems });
  }, [evaluation, refusal, valuesJson, problems]);
  const moveWalker = useCallback((f: number) => setWalker(form, f), [form]);
  // The server's JavaScript engine may round a last bit differently from the browser's, so figures are
  // drawn in the browser only: a server-rendered figure could never match the page it hydrates.
  const result = inBrowser && evaluation.kind === "figures" ? evaluation.result : null;
  // The long list of details below follows at a lower priority, so a dragged walker moves the diagram and headline at once.
  const details = useDeferredValue(result ? { result, gearProblems: evaluation.gearProblems } : null);

  return (
    <>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,27rem)_minmax(0,1fr)]">
        <div className="min-w-0 lg:col-start-2 lg:row-start-1">
          <div className="space-y-4 lg:sticky lg:top-4">
            {mode === "check" ? null : (
              <SaveBar
                mode={mode}
                form={form}
                valuesJson={valuesJson}
                evaluation={evaluation}
                revision={props.revision}
                units={units}
                catalogue={catalogue}
                onRefused={setRefusal}
              />
            )}
            <section aria-labelledby="side-view" className="space-y-3 rounded-panel border border-ink-200 bg-white p-3 shadow-panel">
              <h2 id="side-view" className="sr-only">
                Side view
              </h2>
              {result ? (
                <>
                  <LineDiagram result={result} input={evaluation.input} units={units} onWalkerMove={moveWalker} />
                  <WalkerSlider form={form} fraction={result.walker.positionM / Number(evaluation.input.spanM)} />
                </>
              ) : (
                <p className="p-4 text-ink-700">
                  {inBrowser ? "The side view returns when the input gives figures." : "Working out the figures in your browser…"}
                </p>
              )}
            </section>
            <div className="hidden lg:block">{inBrowser ? <RigSummary evaluation={evaluation} units={units} variant="panel" /> : null}</div>
          </div>
        </div>
        <div className="min-w-0 lg:col-start-1 lg:row-start-1">
          <div className="sticky top-0 z-20 -mx-gutter mb-4 lg:hidden">
            {inBrowser ? <RigSummary evaluation={evaluation} units={units} variant="strip" /> : null}
          </div>
          <KitChangeNotice changes={props.kitChanges ?? []} />
          {formElement}
        </div>
      </div>
      <div className="mt-8 space-y-6">
        {mode === "check" ? <ServerCheck evaluation={evaluation} /> : null}
        {details ? <RigDetails result={details.result} units={units} gearProblems={details.gearProblems} /> : null}
      </div>
    </>
  );
}

/** The planner: a rig's inputs from the crew's Kit and sites, its figures as they are typed, and saving it as a revision. */
export function Planner(props: PlannerProps) {
  const form = useForm<Values>({ resolver: zodResolver(RigInputSchema) as never, mode: "onChange", defaultValues: props.start });
  const problems = useMemo(() => createProblemStore(), []);
  const formSettings = useMemo(() => ({ units: props.units, problems, schemaMessages: "allowed" as const }), [props.units, problems]);
  const planner = useMemo(
    () => ({ catalogue: props.catalogue, sites: props.sites, editable: props.mode !== "view" }),
    [props.catalogue, props.sites, props.mode],
  );
  const formElement = useMemo(
    () => (
      <form noValidate onSubmit={(event) => event.preventDefault()} aria-label="Rig inputs">
        <RigInputForm />
      </form>
    ),
    [],
  );
  return (
    <FormSettingsProvider value={formSettings}>
      <PlannerProvider value={planner}>
        <FormProvider {...form}>
          <Workbench props={props} form={form} problems={problems} formElement={formElement} />
        </FormProvider>
      </PlannerProvider>
    </FormSettingsProvider>
  );
}
