"use client";

import { capacityText, forceIn, forceUnitOf } from "@/physics";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { asNumber } from "@/components/forms/as-number";
import { callApi } from "@/components/forms/call-api";
import { FormError } from "@/components/forms/form-error";
import { useApiForm } from "@/components/forms/use-api-form";
import { Button } from "@/components/ui/button";
import { Field, FieldFrame, controlClasses } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { useToast } from "@/components/ui/toast";
import { TraceChart } from "@/components/charts/trace-chart";

import type { UnitSystem } from "@/lib/rig-form/quantities";
import type { TraceAnalysis } from "@/lib/trace-analysis";
import {
  DEFAULT_DROP,
  FORCE_UNITS,
  SLIP_RESULTS,
  SLIP_RESULT_LABELS,
  SlipTestSchema,
  slipResultText,
  type SlipTest,
  type SlipTestInput,
} from "@/lib/validations/slip-tests";
import type { ForceUnit } from "@/physics";

export interface DeviceOption {
  id: string;
  name: string;
}
export interface RopeOption {
  id: string;
  name: string;
  diameterMm: number;
}

const unitOptions = FORCE_UNITS.map((u) => ({ value: u, label: u }));

/**
 * Records a slip test. With a trace, the server reads it and runs the engine's slip detection first;
 * the detected value fills the result, and the tester confirms it or corrects it (saying why) before saving.
 */
export function SlipTestForm({ devices, ropes, units }: { devices: DeviceOption[]; ropes: RopeOption[]; units: UnitSystem }) {
  const router = useRouter();
  const notify = useToast();
  const [traceError, setTraceError] = useState<string | null>(null);
  const [reading, setReading] = useState(false);
  const crewUnit = forceUnitOf(units);
  const [traceUnit, setTraceUnit] = useState<ForceUnit>(crewUnit);
  const [analysis, setAnalysis] = useState<TraceAnalysis | null>(null);
  const { form, submit, formError } = useApiForm<SlipTestInput, SlipTest>(SlipTestSchema, {
    url: "/api/slip-tests",
    defaultValues: { deviceModelId: devices[0]?.id, result: "slipped", forceUnit: crewUnit, testedOn: new Date().toISOString().slice(0, 10), notes: "" },
    onSuccess: () => {
      notify({ title: "Slip test saved", description: "The slip table now includes it.", tone: "ok" });
      router.push("/slip-bench");
      router.refresh();
    },
  });
  const { register, setValue, formState } = form;
  const { errors, isSubmitting } = formState;

  async function readTrace(form: HTMLFormElement) {
    const data = new FormData(form);
    const file = data.get("file");
    if (!(file instanceof File) || file.size === 0) return setTraceError("Choose the trace's CSV file first.");
    setReading(true);
    setTraceError(null);
    const answer = await callApi("POST", "/api/slip-tests/traces", data);
    setReading(false);
    if (!answer.ok) {
      setAnalysis(null);
      setValue("traceUploadId", undefined);
      return setTraceError(answer.error);
    }
    const found = answer.body.analysis as TraceAnalysis;
    setAnalysis(found);
    // The trace fills these fields: validating them again clears any message left from an earlier attempt.
    const filled = { shouldValidate: formState.isSubmitted };
    setValue("traceUploadId", (answer.body.upload as { id: string }).id, filled);
    setValue("result", found.onset.kind, filled);
    setValue("forceUnit", found.unit, filled);
    setValue("force", forceIn(found.onset.forceN, found.unit, "down"), filled);
  }

  return (
    <div className="max-w-3xl space-y-8">
      <section aria-labelledby="trace-heading" className="space-y-4 rounded-panel border border-ink-200 bg-white p-4">
        <h2 id="trace-heading">Load-cell trace (optional)</h2>
        <p className="text-ink-600">
          A CSV with a time column (seconds) and a force column; a header row, commas, semicolons or tabs, and decimal commas are all read. At most 64 MiB.
        </p>
        <form
          onSubmit={(event) => {
            event.preventDefault();
            void readTrace(event.currentTarget);
          }}
          className="grid gap-4 md:grid-cols-3"
        >
          <div className="md:col-span-3">
            <Field label="Trace file (CSV)" name="file" type="file" accept=".csv,.txt,text/csv,text/plain" className="py-2" />
          </div>
          <Select
            label="Force unit of the trace"
            name="unit"
            options={unitOptions}
            value={traceUnit}
            onChange={(e) => setTraceUnit(e.target.value as ForceUnit)}
          />
          <Field
            key={traceUnit}
            label={`Fall that counts as a slip (${traceUnit})`}
            name="drop"
            inputMode="decimal"
            defaultValue={DEFAULT_DROP[traceUnit]}
            hint="The threshold, not a measurement: the first fall of more than this below the running maximum, while the pull goes on, marks the slip."
          />
          <Field
            label="Pull ended at (s), optional"
            name="pullEndS"
            inputMode="decimal"
            hint="When the trace goes on past the pull into the release, give the time the pull stopped: the release is then not taken for a slip."
          />
          <div className="flex items-end">
            <Button type="submit" tone="secondary" disabled={reading}>
              {reading ? "Reading the trace…" : "Read trace"}
            </Button>
          </div>
          <div className="md:col-span-3">
            <FormError message={traceError ?? errors.traceUploadId?.message} />
          </div>
        </form>
        {analysis ? (
          <div className="space-y-2">
            <TraceChart time={analysis.chart.time} force={analysis.chart.force} units={units} onset={analysis.onset} dropN={analysis.dropN} />
            <p>
              Read {analysis.rows.toLocaleString("en")} rows over {analysis.durationS.toFixed(1)} s (time from “{analysis.timeColumn}”, force from “
              {analysis.forceColumn}”). <strong>Detected: {slipResultText(analysis.onset.kind, capacityText(analysis.onset.forceN, units))}</strong>. Check it
              against the chart, then confirm it below or correct it and say why in the notes.
            </p>
          </div>
        ) : null}
      </section>

      <form onSubmit={submit} noValidate className="space-y-5" aria-labelledby="test-heading">
        <h2 id="test-heading">The test</h2>
        <div className="grid gap-4 md:grid-cols-2">
          <Select
            label="Device tested"
            options={devices.map((d) => ({ value: d.id, label: d.name }))}
            error={errors.deviceModelId?.message}
            {...register("deviceModelId")}
          />
          <Select
            label="Rope (from the Kit)"
            options={[{ value: "", label: "Not in the Kit" }, ...ropes.map((r) => ({ value: r.id, label: `${r.name} (${r.diameterMm} mm)` }))]}
            error={errors.ropeModelId?.message}
            {...register("ropeModelId", {
              setValueAs: (v) => (v === "" ? undefined : v),
              onChange: (e) => {
                const rope = ropes.find((r) => r.id === e.target.value);
                if (rope) setValue("ropeDiameterMm", rope.diameterMm);
              },
            })}
          />
          <Field
            label="Rope diameter (mm)"
            inputMode="decimal"
            hint="As measured, to 0.1 mm (3–25 mm)."
            error={errors.ropeDiameterMm?.message}
            {...register("ropeDiameterMm", { setValueAs: asNumber })}
          />
          <Field label="Tested on" type="date" error={errors.testedOn?.message} {...register("testedOn")} />
          <Select
            label="Result"
            options={SLIP_RESULTS.map((r) => ({ value: r, label: SLIP_RESULT_LABELS[r] }))}
            error={errors.result?.message}
            {...register("result")}
          />
          <div className="grid grid-cols-[1fr_7rem] gap-2">
            <Field label="Force" inputMode="decimal" error={errors.force?.message} {...register("force", { setValueAs: asNumber })} />
            <Select label="Unit" options={unitOptions} error={errors.forceUnit?.message} {...register("forceUnit")} />
          </div>
        </div>
        <FieldFrame id="slip-notes" label="Notes" error={errors.notes?.message}>
          <textarea
            id="slip-notes"
            rows={3}
            className={`${controlClasses} py-2`}
            placeholder="Rope condition, pull rate, anything unusual"
            {...register("notes")}
          />
        </FieldFrame>
        <input type="hidden" {...register("traceUploadId", { setValueAs: (v) => (v === "" ? undefined : v) })} />
        <FormError message={formError} />
        <Button type="submit" disabled={isSubmitting}>
          {analysis ? "Confirm and save slip test" : "Save slip test"}
        </Button>
      </form>
    </div>
  );
}
