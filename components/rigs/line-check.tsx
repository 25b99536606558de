"use client";

import { useDeferredValue, useMemo } from "react";
import { FormProvider, useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { evaluateRig, RigInputError, RigInputSchema, SolveError, type RigInput, type RigInputDraft, type RigResult, type SlipResult } from "@/physics";
import type { UnitSystem } from "@/lib/rig-form/quantities";
import { RigFormSettingsProvider, type EngineFieldError } from "./rig-form-context";
import { RigInputForm } from "./rig-input-form";
import { LineResults } from "./line-results";
import { ServerCheck } from "./server-check";

/** What the browser's engine made of the current input: figures (with the input's JSON, as the server would receive it), or the reason there are none. */
export type Evaluation =
  | { kind: "figures"; input: unknown; inputJson: string; result: RigResult }
  | { kind: "input"; error: EngineFieldError; message: string }
  | { kind: "solve"; message: string };

function evaluate(inputJson: string): Evaluation {
  const input: unknown = JSON.parse(inputJson);
  try {
    return { kind: "figures", input, inputJson, result: evaluateRig(input) };
  } catch (error) {
    if (error instanceof RigInputError) return { kind: "input", error: { field: error.field, allowed: error.allowed }, message: error.message };
    if (error instanceof SolveError) return { kind: "solve", message: error.message };
    throw error;
  }
}

/**
 * The line check: the rig's inputs on one side, the engine's figures on the other, recomputed in the
 * browser on every change; the server confirms them on request and its result is the one of record.
 * The crew's slip bench comes first in the input's slip results, before any the rigger types.
 */
export function LineCheck({ startingRig, units, crewBench }: { startingRig: RigInputDraft; units: UnitSystem; crewBench: readonly SlipResult[] }) {
  const form = useForm<RigInputDraft, unknown, RigInput>({ resolver: zodResolver(RigInputSchema), mode: "onChange", defaultValues: startingRig });
  const values = useWatch({ control: form.control });
  // The JSON the server would receive, once per change: the browser evaluates exactly that, so both see the same input.
  const inputJson = useMemo(() => JSON.stringify({ ...values, slipBench: [...crewBench, ...(values.slipBench ?? [])] }), [values, crewBench]);
  const evaluatedJson = useDeferredValue(inputJson);
  const evaluation = useMemo(() => evaluate(evaluatedJson), [evaluatedJson]);
  const engineError = evaluation.kind === "input" ? evaluation.error : null;
  return (
    <RigFormSettingsProvider value={{ units, engineError, crewBench }}>
      <FormProvider {...form}>
        <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,26rem)_minmax(0,1fr)]">
          <form noValidate onSubmit={(event) => event.preventDefault()} aria-label="Rig inputs" className="min-w-0 space-y-4">
            {/* On a phone the figures come after a long form. */}
            <a href="#figures" className="flex min-h-target items-center font-semibold lg:hidden">
              Go to the figures ↓
            </a>
            <RigInputForm />
          </form>
          <div id="figures" className="min-w-0 scroll-mt-4 space-y-6">
            <ServerCheck evaluation={evaluation} />
            <LineResults evaluation={evaluation} units={units} stale={evaluatedJson !== inputJson} />
          </div>
        </div>
      </FormProvider>
    </RigFormSettingsProvider>
  );
}
