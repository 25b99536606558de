import crypto from "node:crypto";
import type { Knex } from "knex";
import { DEMO_CREW_NAME } from "./01_demo_crew";
import { analyseTrace } from "../lib/trace-analysis";
import { parseTraceCsv } from "../lib/trace-csv";
import { putObject } from "../lib/storage";
import { randomStorageKey } from "../lib/uploads";
import { sha256Hex } from "../lib/sha256";

// Invented gear for the demo crew (no real makers or models) and invented slip tests, three with
// synthetic load-cell traces. Every number here is made up for the demo.

const webbingCurve = [
  { tensionKN: 0, elongationPct: 0 },
  { tensionKN: 1, elongationPct: 1.6 },
  { tensionKN: 3, elongationPct: 3.5 },
  { tensionKN: 6, elongationPct: 5.4 },
  { tensionKN: 10, elongationPct: 7.3 },
];
const ropeCurve = [
  { tensionKN: 0, elongationPct: 0 },
  { tensionKN: 1, elongationPct: 0.9 },
  { tensionKN: 5, elongationPct: 3.1 },
];

// Plain descriptions rather than brand-like names, so that no demo model is anyone's product.
export const MODELS = [
  {
    key: "tubular",
    kind: "webbing",
    name: "Tubular webbing 25 mm",
    specs: { widthMm: 25, massPerMetreG: 48, mbsKN: 32, stretchPoints: webbingCurve },
    notes: "Main longline webbing.",
  },
  {
    key: "flat",
    kind: "webbing",
    name: "Flat webbing 25 mm",
    specs: { widthMm: 25, massPerMetreG: 39, mbsKN: 28, stretchPoints: webbingCurve.map((p) => ({ ...p, elongationPct: p.elongationPct * 1.2 })) },
    notes: "",
  },
  {
    key: "static-11",
    kind: "rope",
    name: "Static rope 11 mm",
    specs: { diameterMm: 11, construction: "static", mbsKN: 30, massPerMetreG: 78, stretchPoints: ropeCurve },
    notes: "Tensioning rope.",
  },
  {
    key: "static-10.5",
    kind: "rope",
    name: "Static rope 10.5 mm",
    specs: { diameterMm: 10.5, construction: "static", mbsKN: 27, massPerMetreG: 70, stretchPoints: ropeCurve },
    notes: "",
  },
  {
    key: "toothed-cam",
    kind: "brake",
    name: "Toothed cam brake",
    specs: { minRopeMm: 9, maxRopeMm: 12, mbsKN: 22 },
    notes: "Toothed cam; inspect the teeth before each rig.",
  },
  { key: "smooth-cam", kind: "brake", name: "Smooth cam brake", specs: { minRopeMm: 10, maxRopeMm: 11.5, mbsKN: 18 }, notes: "" },
  { key: "line-grip", kind: "line_grip", name: "Rope line grip", specs: { minRopeMm: 10, maxRopeMm: 12, mbsKN: 15 }, notes: "" },
  {
    key: "pulley",
    kind: "pulley",
    name: "Ball-bearing pulley 50 mm",
    specs: { sheaveDiameterMm: 50, efficiency: 0.93, mbsKN: 36 },
    notes: "Ball-bearing sheave.",
  },
  { key: "shackle", kind: "connector", name: "Steel bow shackle 12 mm", specs: { mbsKN: 60 }, notes: "" },
  { key: "sling", kind: "sling", name: "Round sling 120 cm", specs: { mbsKN: 40 }, notes: "" },
  { key: "pad", kind: "other", name: "Felt tree pad", specs: {}, notes: "Protects bark under anchor slings." },
] as const;

/** A synthetic slow pull: rising at `rate` N/s with a little noise; past `slipN` the rope creeps through 600 N lower. */
function syntheticTrace(slipN: number | null, rate: number, seconds: number): string {
  const lines = ["time_s;force_kN"];
  let slipped = false;
  for (let i = 0; i <= seconds * 50; i++) {
    const t = i / 50;
    const noise = 15 * Math.sin(i * 0.9);
    slipped ||= slipN !== null && rate * t >= slipN;
    const force = slipped ? slipN! - 600 + noise : rate * t + noise;
    lines.push(`${t.toFixed(2).replace(".", ",")};${(Math.max(force, 0) / 1000).toFixed(4).replace(".", ",")}`);
  }
  return lines.join("\n");
}

export async function seed(knex: Knex): Promise<void> {
  const crew = await knex("crews").where({ name: DEMO_CREW_NAME }).first("id");
  if (!crew) return;
  const tester = await knex("users").where({ email: "sol@greyrock.example" }).first("id");
  const storeBytes = Boolean(process.env.S3_BUCKET);

  await knex.transaction(async (trx) => {
    const ids: Record<string, string> = {};
    for (const m of MODELS) {
      const [{ id }] = await trx("gear_models")
        .insert({ crew_id: crew.id, kind: m.kind, name: m.name, specs: JSON.stringify(m.specs), notes: m.notes })
        .returning("id");
      ids[m.key] = id;
    }
    // The retired item failed the inspection that retired it: inspected first, retired two days later.
    const items = [
      { model: "tubular", label: "TW-01", since: "2025-04-12" },
      { model: "tubular", label: "TW-02", since: "2025-04-12" },
      { model: "toothed-cam", label: "CB-3", since: "2024-09-01" },
      { model: "pulley", label: "P50-A", since: "2024-03-20" },
      {
        model: "flat",
        label: "FW-old",
        since: "2022-06-01",
        inspectedOn: "2026-08-28",
        retiredOn: "2026-08-30",
        reason: "Edge abrasion after a sharp-rock anchor",
      },
    ];
    for (const item of items) {
      const [{ id }] = await trx("gear_items")
        .insert({
          crew_id: crew.id,
          model_id: ids[item.model],
          label: item.label,
          in_service_since: item.since,
          retired_on: item.retiredOn ?? null,
          retired_reason: item.reason ?? null,
        })
        .returning("id");
      await trx("gear_inspections").insert({
        crew_id: crew.id,
        item_id: id,
        inspected_by: tester.id,
        inspected_on: item.inspectedOn ?? "2026-10-04",
        result: item.retiredOn ? "fail" : "pass",
        notes: item.retiredOn ? "Cut through the edge fibres." : "",
      });
    }

    const tests = [
      { device: "toothed-cam", rope: "static-10.5", d: 10.5, result: "slipped", n: 7400, trace: { slipN: 7400, rate: 120, seconds: 80 } },
      { device: "toothed-cam", rope: "static-10.5", d: 10.5, result: "slipped", n: 7900 },
      { device: "toothed-cam", rope: "static-11", d: 11, result: "slipped", n: 8800, trace: { slipN: 8800, rate: 150, seconds: 75 } },
      { device: "toothed-cam", rope: null, d: 10, result: "slipped", n: 6100 },
      { device: "smooth-cam", rope: "static-11", d: 11, result: "held", n: 9000, trace: { slipN: null, rate: 110, seconds: 82 } },
      { device: "smooth-cam", rope: "static-10.5", d: 10.5, result: "slipped", n: 5200 },
      { device: "line-grip", rope: "static-11", d: 11, result: "slipped", n: 4300 },
    ] as const;
    for (const test of tests) {
      let traceUploadId: string | null = null;
      let detected: { kind: string; forceN: number } | null = null;
      let engineVersion: string | null = null;
      if ("trace" in test) {
        const text = syntheticTrace(test.trace.slipN, test.trace.rate, test.trace.seconds);
        const bytes = new TextEncoder().encode(text);
        const analysis = analyseTrace(parseTraceCsv(text, "kN"), "kN", 200);
        const storageKey = randomStorageKey();
        const sha256 = sha256Hex(bytes);
        // `npm start` and `npm test` seed with the S3 fake running; `db:seed` alone stores no bytes unless S3_BUCKET is set.
        if (storeBytes) await putObject(storageKey, bytes, "text/csv", sha256);
        const [{ id }] = await trx("uploads")
          .insert({
            crew_id: crew.id,
            purpose: "trace",
            storage_key: storageKey,
            file_name: `${test.device}-${test.d}mm-pull.csv`,
            content_type: "text/csv",
            byte_size: bytes.byteLength,
            sha256,
            analysis: JSON.stringify(analysis),
            uploaded_by: tester.id,
          })
          .returning("id");
        traceUploadId = id;
        detected = analysis.onset;
        engineVersion = analysis.engineVersion;
      }
      await trx("slip_tests").insert({
        id: crypto.randomUUID(),
        crew_id: crew.id,
        device_model_id: ids[test.device],
        rope_model_id: test.rope ? ids[test.rope] : null,
        rope_diameter_mm: test.d,
        result: test.result,
        force_n: detected ? detected.forceN : test.n,
        force_unit: "kN",
        tested_on: "2026-10-18",
        tested_by: tester.id,
        notes: test.result === "held" ? "Stopped the pull at the load cell's working range." : "",
        trace_upload_id: traceUploadId,
        detected_result: detected?.kind ?? null,
        detected_force_n: detected?.forceN ?? null,
        engine_version: engineVersion,
      });
    }
  });
}
